import { describe, expect, it } from "vitest";
import { renderPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import { input, manyPieces, piece } from "./fixtures";
import { readPdfPages } from "./pdf-ops";

describe("pattern PDF output", () => {
  it("is the same bytes for the same input (creation date from meta)", async () => {
    const inp = input(manyPieces(5));
    const a = await renderPatternPdf(inp, { paper: "a4" });
    const b = await renderPatternPdf(inp, { paper: "a4" });
    expect(a.subarray(0, 5).toString()).toBe("%PDF-");
    expect(Buffer.compare(a, b)).toBe(0);
  });

  it("still renders cover, legend, assembly and one page when no piece could be flattened", async () => {
    const bad = piece("A", [], { flattenable: false, problem: "Piece A is a closed shell: paint a seam across it.", metrics: null });
    const pdf = await renderPatternPdf(input([bad]), { paper: "letter", compress: false });
    expect(readPdfPages(pdf)).toHaveLength(4);
  });

  it("uses the paper size and orientation asked for on the tiles", async () => {
    const pages = readPdfPages(await renderPatternPdf(input(manyPieces(3)), { paper: "a3", compress: false }));
    // Source: ISO 216 A3 = 297 × 420 mm = 841.89 × 1190.55 pt.
    const tile = pages[pages.length - 1];
    expect([tile.width, tile.height].map((v) => Math.round(v * 100) / 100).sort((x, y) => x - y)).toEqual([841.89, 1190.55]);
  });
});
