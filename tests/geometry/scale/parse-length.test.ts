import { describe, expect, it } from "vitest";
import { convertLength, parseLength, parseLengthIn } from "@/lib/geometry/units/parse-length";
import { GeometryError } from "@/lib/geometry/errors";

describe("parseLength", () => {
  it("reads number and unit with or without a space", () => {
    expect(parseLength("6mm")).toEqual({ value: 6, unit: "mm" });
    expect(parseLength("0.5in")).toEqual({ value: 0.5, unit: "in" });
    expect(parseLength("12 cm")).toEqual({ value: 12, unit: "cm" });
    expect(parseLength("1.2m")).toEqual({ value: 1.2, unit: "m" });
    expect(parseLength(" 4\" ")).toEqual({ value: 4, unit: "in" });
    expect(parseLength("3 Inches")).toEqual({ value: 3, unit: "in" });
  });

  it("converts exactly; Source: 1 in = 25.4 mm (international inch, 1959)", () => {
    expect(parseLengthIn("0.5in", "mm")).toBeCloseTo(12.7, 12);
    expect(parseLengthIn("1.2m", "cm")).toBeCloseTo(120, 12);
    expect(convertLength(254, "mm", "in")).toBeCloseTo(10, 12);
  });

  it("takes a bare number only with a default unit", () => {
    expect(parseLength("6", "cm")).toEqual({ value: 6, unit: "cm" });
    expect(() => parseLength("6")).toThrow(/has no unit/);
  });

  it("refuses junk with one clear sentence naming the quantity", () => {
    for (const bad of ["", "mm", "six mm", "3/4in", "6 furlongs", "1.2.3m", "6mm 2mm"]) {
      let err: unknown;
      try {
        parseLength(bad, undefined, "thickness");
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(GeometryError);
      expect((err as GeometryError).code).toBe("BAD_PARAMETER");
      expect((err as GeometryError).message).toMatch(/thickness/);
    }
  });
});
