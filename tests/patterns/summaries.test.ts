import { describe, expect, it } from "vitest";
import { FOAM_MATERIALS, STRICTEST_STRETCH_LIMIT, findFoamMaterial } from "@/lib/patterns/materials";
import { summarizeStretch } from "@/lib/patterns/stretch-summary";
import { buildCutList } from "@/lib/patterns/cut-list";
import { buildLayout, cutCountText, bevelText, RUN_TEXT_SIZE_MM } from "@/lib/patterns/layout";
import { cylinderStretchout, manyPieces, metrics, piece, report } from "./fixtures";

describe("foam materials", () => {
  it("have unique ids and limits between 0 and 50 %", () => {
    expect(new Set(FOAM_MATERIALS.map((m) => m.id)).size).toBe(FOAM_MATERIALS.length);
    for (const m of FOAM_MATERIALS) { expect(m.stretchLimit).toBeGreaterThan(0); expect(m.stretchLimit).toBeLessThan(0.5); }
    expect(findFoamMaterial("EVA foam")?.id).toBe("eva");
    expect(findFoamMaterial(" upholstery-foam ")?.id).toBe("upholstery-foam");
    expect(findFoamMaterial("balsa")).toBeNull();
  });
});

describe("stretch summary", () => {
  const pieces = [piece("A", [[0, 0], [1, 0], [0, 1]], { metrics: metrics(0.02) }), piece("B", [[0, 0], [1, 0], [0, 1]], { metrics: metrics(0.07) })];

  it("flags pieces over the chosen foam's limit", () => {
    const eva = summarizeStretch(pieces, "eva"); // limit 5 %
    expect(eva.rows.map((r) => r.flagged)).toEqual([false, true]);
    const upholstery = summarizeStretch(pieces, "upholstery-foam"); // limit 10 %
    expect(upholstery.flaggedCount).toBe(0);
  });

  it("uses the strictest limit for an unknown material and says so", () => {
    const s = summarizeStretch(pieces, "mystery foam");
    expect(s.limit).toBe(STRICTEST_STRETCH_LIMIT);
    expect(s.limitNote).toContain("mystery foam");
    expect(s.rows[0].flagged).toBe(0.02 > STRICTEST_STRETCH_LIMIT);
  });

  it("flags folded triangles and unflattenable pieces", () => {
    const bad = piece("C", [], { flattenable: false, problem: "Piece C is a closed shell: add a seam.", metrics: null });
    const folded = piece("D", [[0, 0], [1, 0], [0, 1]], { metrics: { ...metrics(0.01), flippedTriangles: 3 } });
    const s = summarizeStretch([bad, folded], "eva");
    expect(s.rows[0]).toMatchObject({ flagged: true, note: "Piece C is a closed shell: add a seam." });
    expect(s.rows[1].flagged).toBe(true);
  });
});

describe("cut list", () => {
  it("cut length = perimeter × count; area from the outline (cylinder stretchout 2πr × h)", () => {
    // Source: stretchout of a cylinder r = 30 mm, h = 80 mm is a 188.496 × 80 mm rectangle.
    const a = cylinderStretchout({ radius: 30, height: 80 });
    a.count = 2; a.mirrored = true;
    const layout = buildLayout(report([a]), "EVA foam", 6);
    const cl = buildCutList(layout);
    const w = 2 * Math.PI * 30;
    expect(cl.rows[0].areaMm2).toBeCloseTo(w * 80, 6);
    expect(cl.rows[0].perimeterMm).toBeCloseTo(2 * (w + 80), 6);
    expect(cl.rows[0].cutLengthMm).toBeCloseTo(4 * (w + 80), 6);
    expect(cl.totalPieces).toBe(2);
  });

  it("converts report units to millimetres (report in metres)", () => {
    const a = piece("A", [[0, 0], [0.5, 0], [0.5, 0.2], [0, 0.2]]);
    const layout = buildLayout(report([a], "m"), "EVA foam", 6);
    expect(layout.pieces[0].areaMm2).toBeCloseTo(500 * 200, 6);
    expect(layout.widthMm).toBeCloseTo(500 + 12, 9);
  });
});

describe("piece annotations", () => {
  it("words counts and bevels for the fabricator", () => {
    expect(cutCountText({ count: 1, mirrored: false })).toBe("cut 1");
    expect(cutCountText({ count: 2, mirrored: true })).toBe("cut 2, one mirrored");
    expect(bevelText({ kind: "straight", opensTo: "none", bevelDeg: 0 })).toBe("square cut");
    expect(bevelText({ kind: "ridge", opensTo: "outer", bevelDeg: 22.4 })).toBe("bevel 22\u00b0 wide on top");
    expect(bevelText({ kind: "valley", opensTo: "inner", bevelDeg: -15 })).toBe("bevel 15\u00b0 wide underneath");
  });

  it("puts the label inside the piece, ticks pointing inward and run texts inside the outline", () => {
    const layout = buildLayout(report(manyPieces(12)), "EVA foam", 6);
    for (const p of layout.pieces) {
      const inside = (x: number, y: number) => {
        let c = false;
        const o = p.outline, n = o.length / 2;
        for (let i = 0, j = n - 1; i < n; j = i++) {
          if (o[2 * i + 1] > y !== o[2 * j + 1] > y && x < ((o[2 * j] - o[2 * i]) * (y - o[2 * i + 1])) / (o[2 * j + 1] - o[2 * i + 1]) + o[2 * i]) c = !c;
        }
        return c;
      };
      expect(inside(p.labelX, p.labelY)).toBe(true);
      for (const t of p.ticks) expect(inside(t.x1, t.y1)).toBe(true);
      for (const r of p.runs) for (const l of r.labels) expect(inside(l.x, l.y)).toBe(true);
      for (const r of p.runs) for (const c of r.chevrons) expect(inside(c.apexX, c.apexY)).toBe(true);
    }
  });

  it("repeats the neighbour text along long seams (one copy per ~160 mm)", () => {
    const long = cylinderStretchout({ radius: 10, height: 800 });
    const layout = buildLayout(report([long]), "EVA foam", 6);
    for (const r of layout.pieces[0].runs) {
      expect(r.labels).toHaveLength(5);
      const ys = r.labels.map((l) => l.y).sort((a, b) => a - b);
      for (let i = 1; i < ys.length; i++) expect(ys[i] - ys[i - 1]).toBeCloseTo(160, 6);
    }
  });

  it("keeps seam texts clear of the tick numbers and of the label block", () => {
    const layout = buildLayout(report(manyPieces(20)), "EVA foam", 6);
    for (const p of layout.pieces) {
      const blockHalf = (p.labelSizeMm + p.infoLines.length * p.infoSizeMm * 1.25) / 2;
      for (const r of p.runs) for (const l of r.labels) {
        expect(Math.hypot(l.x - p.labelX, l.y - p.labelY)).toBeGreaterThan(blockHalf + RUN_TEXT_SIZE_MM / 2);
        for (const t of p.ticks) expect(Math.hypot(l.x - t.numX, l.y - t.numY)).toBeGreaterThan(RUN_TEXT_SIZE_MM);
      }
    }
  });
});
