/**
 * Text of the PDF, extracted with `pdftotext` (poppler-utils) so the check goes through a real PDF reader and also
 * proves the embedded font maps glyphs back to text.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { renderPatternPdf, planPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import { SAFETY_CAUTIONS, SAFETY_REMINDER } from "@/lib/safety/cautions";
import { input, manyPieces, piece, tubeAssembly } from "./fixtures";

const dir = mkdtempSync(path.join(tmpdir(), "peelform-pdf-"));

function pageTexts(pdf: Buffer, name: string): string[] {
  const file = path.join(dir, `${name}.pdf`);
  writeFileSync(file, pdf);
  const all = execFileSync("pdftotext", ["-raw", file, "-"], { encoding: "utf8" });
  return all.split("\f").slice(0, -1).map((t) => t.replace(/\s+/g, " "));
}

describe("pattern PDF text", () => {
  const inp = input(manyPieces(30), { assembly: tubeAssembly(6) });
  let pages: string[] = [];
  beforeAll(async () => { pages = pageTexts(await renderPatternPdf(inp, { paper: "letter" }), "thirty"); });

  it("has the cautions in full on the cover", () => {
    const cover = pages[0];
    for (const c of SAFETY_CAUTIONS) {
      expect(cover).toContain(c.title);
      for (const l of c.lines) expect(cover).toContain(l);
    }
  });

  it("prints the test-square instruction and the safety reminder on every page", () => {
    const reminderStart = SAFETY_REMINDER.split(" ").slice(0, 6).join(" ");
    for (const t of pages) {
      expect(t).toContain("PRINT AT 100% / ACTUAL SIZE");
      expect(t).toContain("5 cm");
      expect(t).toContain("1 in");
      expect(t).toContain(reminderStart);
    }
  });

  it("labels each tile with its row and column and numbers the pages", () => {
    const { plan } = planPatternPdf(inp, { paper: "letter" });
    const printed = plan.tiles.filter((t) => !t.blank);
    const tilePages = pages.slice(-printed.length);
    printed.forEach((t, i) => expect(tilePages[i]).toContain(`Tile R${t.row}-C${t.col}: row ${t.row} of ${plan.rows}, column ${t.col} of ${plan.cols}`));
    pages.forEach((t, i) => expect(t).toContain(`page ${i + 1} of ${pages.length}`));
  });

  it("has the cover facts, flags the over-stretched piece and lists the cut list", () => {
    const cover = pages[0];
    expect(cover).toContain("Harbour Lantern Festival - Sea Serpent");
    expect(cover).toContain("250.0 %");
    expect(cover).toContain("EVA foam, 6 mm thick");
    expect(cover).toContain("2026-11-30");
    expect(cover).toMatch(/C cut 1 .* 9\.0 % .*over 5 % limit/);
    const assembly = pages.find((t) => t.includes("Cut list"))!;
    expect(assembly).toContain("Front");
    expect(assembly).toContain("Three-quarter");
  });

  it("draws piece letters, counts, neighbour letters and bevel text on the tiles", () => {
    const tiles = pages.join(" ");
    expect(tiles).toContain("cut 2, one mirrored");
    expect(tiles).toContain("EVA foam 6 mm");
    // Seam texts run along the edge (rotated): pdftotext splits them into glyphs, so compare without spaces.
    const flat = tiles.replace(/\s+/g, "");
    expect(flat).toContain("joinsB,bevel12°wideontop");
    expect(flat).toContain("joinsA,bevel12°wideunderneath");
  });

  it("sets text without JetBrains Mono's programming ligatures (they garble '!=', '=>', '===')", async () => {
    const name = "Crate -> Lid != Box => www ===";
    const lig = input(manyPieces(2));
    lig.meta.projectName = name;
    const cover = pageTexts(await renderPatternPdf(lig, { paper: "letter" }), "ligatures")[0];
    expect(cover).toContain(name);
  });

  it("has the cautions on the cover of every kind of pattern (full size, no mesh, nothing flattened)", async () => {
    const nothing = piece("A", [], { flattenable: false, problem: "Piece A is a closed shell: paint a seam across it.", metrics: null });
    const variants: [string, Parameters<typeof renderPatternPdf>[0], Parameters<typeof renderPatternPdf>[1]][] = [
      ["full", input(manyPieces(4), { assembly: tubeAssembly(3) }), { paper: "full" }],
      ["a4-no-mesh", input(manyPieces(4)), { paper: "a4" }],
      ["nothing", input([nothing]), { paper: "tabloid" }],
    ];
    for (const [name, inp, opts] of variants) {
      const cover = pageTexts(await renderPatternPdf(inp, opts), name)[0];
      for (const c of SAFETY_CAUTIONS) for (const l of [c.title, ...c.lines]) expect(cover, name).toContain(l);
    }
  });
});
