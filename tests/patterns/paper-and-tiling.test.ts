import { describe, expect, it } from "vitest";
import { PAPER_SIZES, PT_PER_MM, mmToPt, ptToMm } from "@/lib/patterns/paper-sizes";
import { FULL_MIN_WIDTH_MM, KEY_GAP_PT, KEY_STRIP_PT, PAGE_MARGIN_PT, planTiles } from "@/lib/patterns/tiling";

describe("paper sizes", () => {
  it("match the standards in PDF points", () => {
    // Source: ISO 32000-1:2008 §8.3.2.3 — 1 unit = 1/72 in. Source: ANSI/ASME Y14.1 — Letter 8.5 × 11 in.
    expect(PAPER_SIZES.letter.widthPt).toBe(612);
    expect(PAPER_SIZES.letter.heightPt).toBe(792);
    // Source: ANSI/ASME Y14.1 — Tabloid (B) 11 × 17 in.
    expect(PAPER_SIZES.tabloid.widthPt).toBe(792);
    expect(PAPER_SIZES.tabloid.heightPt).toBe(1224);
    // Source: ISO 216 — A4 210 × 297 mm = 595.28 × 841.89 pt; A3 297 × 420 mm = 841.89 × 1190.55 pt.
    expect(PAPER_SIZES.a4.widthPt).toBeCloseTo(595.28, 2);
    expect(PAPER_SIZES.a4.heightPt).toBeCloseTo(841.89, 2);
    expect(PAPER_SIZES.a3.widthPt).toBeCloseTo(841.89, 2);
    expect(PAPER_SIZES.a3.heightPt).toBeCloseTo(1190.55, 2);
  });

  it("converts millimetres and points both ways", () => {
    // Source: 1 in = 25.4 mm = 72 pt.
    expect(mmToPt(25.4)).toBeCloseTo(72, 12);
    expect(ptToMm(72)).toBeCloseTo(25.4, 12);
    expect(PT_PER_MM).toBeCloseTo(2.834645669, 8);
  });
});

describe("planTiles", () => {
  const sheet = (w: number, h: number) => ({ left: 0, top: h, widthMm: w, heightMm: h });
  const portraitW = ptToMm(612 - 2 * PAGE_MARGIN_PT);
  const portraitH = ptToMm(792 - 2 * PAGE_MARGIN_PT - KEY_STRIP_PT - KEY_GAP_PT);

  it("keeps a sheet that fits one window on one page", () => {
    const p = planTiles(sheet(100, 100), "letter", 10);
    expect(p.rows * p.cols).toBe(1);
    expect(p.orientation).toBe("portrait");
  });

  it("counts tiles as ceil((L − overlap) / (window − overlap)) and picks the orientation with fewer pages", () => {
    const p = planTiles(sheet(600, 600), "letter", 10);
    const portrait = Math.ceil((600 - 10) / (portraitW - 10)) * Math.ceil((600 - 10) / (portraitH - 10));
    const landW = ptToMm(792 - 2 * PAGE_MARGIN_PT), landH = ptToMm(612 - 2 * PAGE_MARGIN_PT - KEY_STRIP_PT - KEY_GAP_PT);
    const landscape = Math.ceil((600 - 10) / (landW - 10)) * Math.ceil((600 - 10) / (landH - 10));
    expect(p.rows * p.cols).toBe(Math.min(portrait, landscape));
    expect(p.tiles).toHaveLength(p.rows * p.cols);
    // The last window reaches the far edges of the sheet.
    const last = p.tiles[p.tiles.length - 1];
    expect(last.x0 + p.contentWMm).toBeGreaterThanOrEqual(600);
    expect(last.yTop - p.contentHMm).toBeLessThanOrEqual(0);
  });

  it("names tiles by row and column, left to right then top to bottom", () => {
    const p = planTiles(sheet(500, 500), "a4", 10);
    expect(p.tiles[0].name).toBe("R1-C1");
    expect(p.tiles[1].name).toBe(p.cols > 1 ? "R1-C2" : "R2-C1");
    expect(p.tiles[p.tiles.length - 1].name).toBe(`R${p.rows}-C${p.cols}`);
  });

  it("makes a full page as large as the sheet plus margins and key strip", () => {
    const p = planTiles(sheet(1500, 800), "full", 10);
    expect(p.rows * p.cols).toBe(1);
    expect(p.widthPt).toBeCloseTo(1500 * PT_PER_MM + 2 * PAGE_MARGIN_PT, 9);
    expect(p.heightPt).toBeCloseTo(800 * PT_PER_MM + 2 * PAGE_MARGIN_PT + KEY_STRIP_PT + KEY_GAP_PT, 9);
    const small = planTiles(sheet(50, 50), "full", 10);
    expect(small.widthPt).toBeCloseTo(FULL_MIN_WIDTH_MM * PT_PER_MM + 2 * PAGE_MARGIN_PT, 9);
  });

  it("refuses an overlap that leaves no window", () => {
    expect(() => planTiles(sheet(500, 500), "letter", 150)).toThrow(/too large/);
  });
});

describe("full-size page limit", () => {
  it("refuses a single page over 200 in a side (ISO 32000-1 Annex C.2: 14 400 units)", () => {
    expect(() => planTiles({ left: 0, top: 0, widthMm: 5200, heightMm: 300 }, "full", 10)).toThrow(/at most 5080 mm/);
    expect(planTiles({ left: 0, top: 0, widthMm: 4900, heightMm: 300 }, "full", 10).widthPt).toBeLessThan(14400);
  });
});
