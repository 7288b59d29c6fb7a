import { describe, expect, it } from "vitest";
import { computeScale, referencedBoxSize } from "@/lib/geometry/scale/compute-scale";

describe("computeScale", () => {
  it("a sculpt 3 wide built 7 wide is ×2.333, 233 %", () => {
    // Common practice: enlargement = target ÷ original
    const s = computeScale([3, 1, 1], "in", "in", { target: { length: 7 } });
    expect(s.factor).toBeCloseTo(7 / 3, 12);
    expect(Math.round(s.percent)).toBe(233);
    expect(s.targetWidth).toBe(7);
  });

  it("a 4 in sculpt built 10 in wide is 250 %", () => {
    // Common practice: 10 ÷ 4 = 2.5
    expect(computeScale([4, 2, 2], "in", "in", { target: { length: 10, axis: "x" } }).percent).toBe(250);
  });

  it("mixes units: a 100 mm sculpt to 0.5 m is ×5, coordinates mm→cm ×0.5", () => {
    const s = computeScale([100, 20, 20], "mm", "cm", { target: { length: 50 } });
    expect(s.factor).toBeCloseTo(5, 12);
    expect(s.coordinateFactor).toBeCloseTo(0.5, 12);
  });

  it("named axis and largest extent", () => {
    expect(computeScale([1, 2, 4], "mm", "mm", { target: { length: 8, axis: "z" } }).factor).toBeCloseTo(2, 12);
    expect(computeScale([1, 2, 4], "mm", "mm", { target: { length: 8, axis: "largest" } }).factor).toBeCloseTo(2, 12);
    expect(computeScale([1, 2, 4], "mm", "mm", { target: { length: 8, axis: "y" } }).factor).toBeCloseTo(4, 12);
  });

  it("factor and defaults", () => {
    expect(computeScale([1, 1, 1], "mm", "mm", { factor: 2.5 }).percent).toBe(250);
    expect(computeScale([1, 1, 1], "mm", "mm", {}).factor).toBe(1);
  });

  it("rejects bad requests", () => {
    expect(() => computeScale([1, 1, 1], "mm", "mm", { factor: 2, target: { length: 3 } })).toThrow(/not both/);
    expect(() => computeScale([1, 1, 1], "mm", "mm", { factor: -1 })).toThrow(/positive/);
    expect(() => computeScale([1, 1, 0], "mm", "mm", { target: { length: 3, axis: "z" } })).toThrow(/no extent/);
  });

  it("bounding box counts referenced vertices only", () => {
    const positions = new Float64Array([0, 0, 0, 2, 0, 0, 0, 3, 0, 100, 100, 100]);
    expect(referencedBoxSize(positions, new Uint32Array([0, 1, 2]))).toEqual([2, 3, 0]);
  });
});
