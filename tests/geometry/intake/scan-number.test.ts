import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { scanFloat, scanInt, scanState } from "@/lib/geometry/intake/scan-number";
import { utf8 } from "@/tests/fixtures/intake/small-meshes";

function parse(text: string): number {
  const b = utf8(text);
  return scanFloat(b, 0, b.length);
}

// Reference: JavaScript's own Number(string), which rounds correctly (Source: ECMA-262, §7.1.4.1.1
// StringToNumber, "rounded … as described in IEEE 754-2019 roundTiesToEven").
describe("scanFloat", () => {
  it("agrees with Number() on the shortest round-trip form of any finite double", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(Object.is(parse(String(x)), Object.is(x, -0) ? 0 : x)).toBe(true);
      }),
      { numRuns: 5000 },
    );
  });

  it("agrees with Number() on fixed, precision and exponent forms", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), fc.integer({ min: 1, max: 21 }), (x, p) => {
        for (const s of [x.toFixed(Math.min(p, 12)), x.toPrecision(p), x.toExponential(Math.min(p, 20))]) {
          expect(Object.is(parse(s), Number(s))).toBe(true);
        }
      }),
      { numRuns: 5000 },
    );
  });

  it("handles the edge forms", () => {
    const cases = ["0", "-0", "+1", ".5", "5.", "-.25e-3", "1E3", "1e22", "1e23", "1e-22", "1e-23", "0.1", "0.30000000000000004",
      "9007199254740993", "123456789012345678901234567890", "1.7976931348623157e308", "4.9e-324", "2.2250738585072014e-308", "000123.4500"];
    for (const s of cases) expect(Object.is(parse(s), Number(s))).toBe(true);
    expect(parse("1e999")).toBe(Infinity);
    expect(parse("-1e999")).toBe(-Infinity);
  });

  it("stops at the first byte that cannot continue the number and reports no number for words", () => {
    const b = utf8("12.5kg");
    expect(scanFloat(b, 0, b.length)).toBe(12.5);
    expect(scanState.end).toBe(4);
    for (const w of ["nan", "inf", "abc", "-", ".", "+e5", ""]) {
      const bytes = utf8(w);
      expect(Number.isNaN(scanFloat(bytes, 0, bytes.length))).toBe(true);
      expect(scanState.end).toBe(0);
    }
  });
});

describe("scanInt", () => {
  it("reads signed integers and refuses non-digits", () => {
    const b = utf8("-42/7");
    expect(scanInt(b, 0, b.length)).toBe(-42);
    expect(scanState.end).toBe(3);
    expect(Number.isNaN(scanInt(utf8("x"), 0, 1))).toBe(true);
    expect(scanInt(utf8("99999999999999999999"), 0, 20)).toBe(Infinity);
  });
});
