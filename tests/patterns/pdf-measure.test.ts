import { describe, expect, it } from "vitest";
import { renderPatternPdf, planPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import { KEY_GAP_PT, KEY_STRIP_PT, PAGE_MARGIN_PT } from "@/lib/patterns/tiling";
import { cylinderStretchout, input, piece, report } from "./fixtures";
import { bbox, readPdfPages, strokedPolygons, strokedRects } from "./pdf-ops";

// Source: ISO 32000-1:2008 §8.3.2.3 — default user space unit = 1/72 in; 1 in = 25.4 mm (1959 agreement).
const PT_PER_MM = 72 / 25.4;
// Source: 1 in = 72 pt; 5 cm = 50 mm × 72 / 25.4 = 141.732 pt.
const ONE_INCH_PT = 72;
const FIVE_CM_PT = 141.732;

function hasSquare(rects: ReturnType<typeof strokedRects>, side: number): boolean {
  return rects.some((r) => Math.abs(r.w - side) < 0.01 && Math.abs(r.h - side) < 0.01);
}

describe("test squares", () => {
  it("every page carries a 1 in (72 pt) and a 5 cm (141.73 pt) square, measured from the drawing operators", async () => {
    for (const paper of ["letter", "a4", "full"] as const) {
      const pdf = await renderPatternPdf(input([cylinderStretchout({ radius: 20, height: 50 })]), { paper, compress: false });
      const pages = readPdfPages(pdf);
      expect(pages.length).toBeGreaterThanOrEqual(4);
      for (const page of pages) {
        const rects = strokedRects(page);
        expect(hasSquare(rects, ONE_INCH_PT)).toBe(true);
        expect(hasSquare(rects, FIVE_CM_PT)).toBe(true);
        // The squares lie on the page.
        for (const r of rects.filter((q) => Math.abs(q.w - FIVE_CM_PT) < 0.01)) {
          expect(r.minX).toBeGreaterThanOrEqual(0);
          expect(r.maxY).toBeLessThanOrEqual(page.height);
        }
      }
    }
  });
});

describe("true size of a piece", () => {
  // Source: a right circular cylinder's lateral surface unrolls to a 2πr × h rectangle.
  const r = 2, h = 5; // cm
  const widthMm = 2 * Math.PI * r * 10; // 125.664 mm
  const heightMm = h * 10;

  it("a cylinder stretchout (2πr × h, report in cm) measures 2πr × h in the PDF within 0.1 mm, on Letter and full size", async () => {
    for (const paper of ["letter", "full"] as const) {
      const inp = input([cylinderStretchout({ radius: r, height: h })], {}, "cm");
      const pdf = await renderPatternPdf(inp, { paper, compress: false });
      const pages = readPdfPages(pdf);
      const tile = pages[pages.length - 1];
      const quads = strokedPolygons(tile, 4).map(bbox).filter((b) => b.w > 100);
      expect(quads.length).toBeGreaterThanOrEqual(1);
      const b = quads[0];
      expect(Math.abs(b.w / PT_PER_MM - widthMm)).toBeLessThan(0.1);
      expect(Math.abs(b.h / PT_PER_MM - heightMm)).toBeLessThan(0.1);
    }
  });
});

describe("tiling", () => {
  it("a 400 mm wide piece on Letter: tile count, orientation and the 10 mm overlap measured between tiles", async () => {
    const strip = piece("A", [[0, 0], [400, 0], [400, 50], [0, 50]]);
    const inp = input([strip]);
    const { plan } = planPatternPdf(inp, { paper: "letter", overlapMm: 10 });
    // Source: ANSI/ASME Y14.1 Letter 8.5 × 11 in = 612 × 792 pt. Drawing window = page − margins − key strip.
    const sheetW = 400 + 12; // piece + 6 mm padding each side
    const portraitW = (612 - 2 * PAGE_MARGIN_PT) / PT_PER_MM;
    const landscapeW = (792 - 2 * PAGE_MARGIN_PT) / PT_PER_MM;
    const cols = (w: number) => Math.ceil((sheetW - 10) / (w - 10));
    expect(cols(portraitW)).toBe(3);
    expect(cols(landscapeW)).toBe(2);
    expect(plan.orientation).toBe("landscape");
    expect(plan.rows * plan.cols).toBe(2);
    const landscapeH = (612 - 2 * PAGE_MARGIN_PT - KEY_STRIP_PT - KEY_GAP_PT) / PT_PER_MM;
    expect(plan.contentHMm).toBeCloseTo(landscapeH, 9);

    const pdf = await renderPatternPdf(inp, { paper: "letter", overlapMm: 10, compress: false });
    const pages = readPdfPages(pdf);
    const tiles = pages.slice(-2);
    for (const t of tiles) { expect(t.width).toBeCloseTo(792, 6); expect(t.height).toBeCloseTo(612, 6); }
    const left = tiles.map((t) => strokedPolygons(t, 4).map(bbox).find((b) => Math.abs(b.h / PT_PER_MM - 50) < 0.1)!);
    // The same outline is drawn on both tiles, shifted by one step = window width − overlap.
    const stepMm = (left[0].minX - left[1].minX) / PT_PER_MM;
    const overlapMm = landscapeW - stepMm;
    expect(Math.abs(overlapMm - 10)).toBeLessThan(0.01);
    expect(Math.abs(left[0].w / PT_PER_MM - 400)).toBeLessThan(0.1);

    // Alignment crosses: circles of 3 mm radius in the shared band; each must print on both tiles at the same
    // sheet position, i.e. shifted by exactly one step between the pages.
    const circles = (page: (typeof tiles)[number]) =>
      page.paths.filter((p) => p.paint === "S").flatMap((p) => p.subpaths).map(bbox)
        .filter((b) => Math.abs(b.w / PT_PER_MM - 6) < 0.01 && Math.abs(b.h / PT_PER_MM - 6) < 0.01)
        .map((b) => [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2]);
    const c1 = circles(tiles[0]), c2 = circles(tiles[1]);
    expect(c1.length).toBeGreaterThanOrEqual(3);
    expect(c2.length).toBe(c1.length);
    for (const [x, y] of c1) {
      expect(c2.some(([x2, y2]) => Math.abs(x - stepMm * PT_PER_MM - x2) < 0.01 && Math.abs(y - y2) < 0.01)).toBe(true);
      // …and lie inside the overlap band of the first tile (the last 10 mm of its window).
      const windowRight = PAGE_MARGIN_PT + landscapeW * PT_PER_MM;
      expect(x).toBeGreaterThan(windowRight - 10 * PT_PER_MM);
      expect(x).toBeLessThan(windowRight);
    }
  });

  it("a layout larger than a page in both directions gets rows × columns tiles and a page map", async () => {
    const big = piece("A", [[0, 0], [500, 0], [500, 450], [0, 450]]);
    const { plan } = planPatternPdf(input([big]), { paper: "a4", overlapMm: 15 });
    expect(plan.rows).toBeGreaterThan(1);
    expect(plan.cols).toBeGreaterThan(1);
    // Every point of the sheet is inside some window, and neighbouring windows share exactly the overlap.
    for (const t of plan.tiles) {
      if (t.col > 1) {
        const prev = plan.tiles.find((q) => q.row === t.row && q.col === t.col - 1)!;
        expect(prev.x0 + plan.contentWMm - t.x0).toBeCloseTo(15, 9);
      }
    }
    const last = plan.tiles[plan.tiles.length - 1];
    expect(last.x0 + plan.contentWMm).toBeGreaterThanOrEqual(500 + 6);
    expect(last.yTop - plan.contentHMm).toBeLessThanOrEqual(-6);
  });

  it("rejects an overlap outside 0…40 mm and an unknown paper with a clear message", async () => {
    const inp = input([cylinderStretchout({ radius: 20, height: 50 })]);
    await expect(renderPatternPdf(inp, { paper: "letter", overlapMm: -1 })).rejects.toThrow(/overlapMm/);
    await expect(renderPatternPdf(inp, { paper: "letter", overlapMm: 80 })).rejects.toThrow(/overlapMm/);
    await expect(renderPatternPdf(inp, { paper: "b5" as never })).rejects.toThrow(/paper must be one of/);
  });

  it("rejects non-finite outline coordinates", async () => {
    const p = piece("A", [[0, 0], [Number.NaN, 0], [1, 1]]);
    await expect(renderPatternPdf({ ...input([]), report: report([p]) }, { paper: "letter" })).rejects.toThrow(/non-finite/);
  });
});

describe("blank tiles", () => {
  it("leaves out tiles no piece reaches into, and draws each printed piece's outline in full across its tiles", async () => {
    // Two 60 mm squares at opposite corners of a 700 × 500 mm sheet: only the corner tiles hold anything.
    const a = piece("A", [[0, 0], [60, 0], [60, 60], [0, 60]]);
    const b = piece("B", [[640, 440], [700, 440], [700, 500], [640, 500]]);
    const inp = input([a, b]);
    const { plan } = planPatternPdf(inp, { paper: "letter" });
    const printed = plan.tiles.filter((t) => !t.blank);
    expect(plan.tiles.length).toBeGreaterThan(4);
    expect(printed.length).toBe(2);
    expect(printed.map((t) => t.name)).toEqual(["R1-C" + plan.cols, `R${plan.rows}-C1`]);
    const pages = readPdfPages(await renderPatternPdf(inp, { paper: "letter", compress: false }));
    expect(pages).toHaveLength(3 + printed.length);
    for (const page of pages.slice(3)) {
      const squares = strokedPolygons(page, 4).map(bbox).filter((q) => Math.abs(q.w / PT_PER_MM - 60) < 0.1 && Math.abs(q.h / PT_PER_MM - 60) < 0.1);
      expect(squares).toHaveLength(1);
    }
  });
});
