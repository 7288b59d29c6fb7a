import { describe, expect, it } from "vitest";
import { renderPatternSvg } from "@/lib/patterns/render-pattern-svg";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { cylinderStretchout, input, manyPieces } from "./fixtures";

function pathBox(d: string) {
  const nums = [...d.matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
  const xs = nums.map((p) => p[0]), ys = nums.map((p) => p[1]);
  return { w: Math.max(...xs) - Math.min(...xs), h: Math.max(...ys) - Math.min(...ys), n: nums.length };
}

describe("renderPatternSvg", () => {
  it("is sized in millimetres with a millimetre viewBox matching width and height", () => {
    const svg = renderPatternSvg(input(manyPieces(8)));
    const root = svg.match(/<svg [^>]*>/)![0];
    const w = root.match(/ width="([\d.]+)mm"/), h = root.match(/ height="([\d.]+)mm"/);
    const vb = root.match(/viewBox="0 0 ([\d.]+) ([\d.]+)"/);
    expect(w && h && vb).toBeTruthy();
    expect(Number(vb![1])).toBe(Number(w![1]));
    expect(Number(vb![2])).toBe(Number(h![1]));
  });

  it("draws a cylinder stretchout (2πr × h, report in inches) at true size within 0.1 mm", () => {
    // Source: lateral surface of a cylinder unrolls to 2πr × h; 1 in = 25.4 mm exactly.
    const r = 1.5, h = 3; // in
    const svg = renderPatternSvg(input([cylinderStretchout({ radius: r, height: h })], {}, "in"));
    const d = svg.match(/<path id="A-outline"[^>]* d="([^"]+)"/)![1];
    const b = pathBox(d);
    expect(b.n).toBe(4);
    expect(Math.abs(b.w - 2 * Math.PI * r * 25.4)).toBeLessThan(0.1);
    expect(Math.abs(b.h - h * 25.4)).toBeLessThan(0.1);
    // Sheet = piece + 6 mm padding on each side.
    const W = Number(svg.match(/ width="([\d.]+)mm"/)![1]);
    expect(Math.abs(W - (2 * Math.PI * r * 25.4 + 12))).toBeLessThan(0.01);
  });

  it("has one group per piece with outline, ticks, bevels and labels sub-groups", () => {
    const pieces = manyPieces(6);
    const svg = renderPatternSvg(input(pieces));
    for (const p of pieces) {
      expect(svg).toContain(`<g id="${p.label}" class="piece"`);
      for (const part of ["outline", "ticks", "bevels", "labels"]) expect(svg).toContain(`id="${p.label}-${part}"`);
      const group = svg.slice(svg.indexOf(`<g id="${p.label}-ticks"`), svg.indexOf(`<g id="${p.label}-bevels"`));
      expect((group.match(/<line /g) ?? []).length).toBe(p.ticks.length);
    }
    expect(svg).toContain("cut 2, one mirrored");
    expect(svg).toContain("joins B, bevel");
  });

  it("shows the safety cautions in a notes band below the sheet, and in its description; escapes text", () => {
    const inp = input(manyPieces(2));
    inp.meta.projectName = "Rock & <Roll>";
    const svg = renderPatternSvg(inp);
    expect(svg).toContain("Rock &amp; &lt;Roll&gt;");
    const notes = svg.slice(svg.indexOf('<g id="notes"'));
    for (const c of SAFETY_CAUTIONS) {
      expect(svg.slice(svg.indexOf("<desc>"), svg.indexOf("</desc>"))).toContain(c.title);
      for (const l of c.lines) expect(notes).toContain(`>${l.replace(/&/g, "&amp;")}</text>`);
    }
    // The notes lie below every piece: the band starts where the sheet ends.
    const noteY = [...notes.matchAll(/<text x="2" y="([\d.]+)"/g)].map((m) => Number(m[1]));
    const sheetH = Math.max(...[...svg.matchAll(/class="outline cut" d="([^"]+)"/g)].flatMap((m) => [...m[1].matchAll(/[ML][-\d.]+ ([-\d.]+)/g)].map((q) => Number(q[1]))));
    expect(Math.min(...noteY)).toBeGreaterThan(sheetH);
  });
});
