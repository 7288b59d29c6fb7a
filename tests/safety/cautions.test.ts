import { describe, expect, it } from "vitest";
import { createRequire } from "node:module";
import { SAFETY_CAUTIONS, SAFETY_REMINDER, safetyCautionsText } from "@/lib/safety/cautions";
import { jetbrainsMonoBold, jetbrainsMonoRegular } from "@/lib/fonts/font-files";
import { GLYPH_RANGES, printableText } from "@/lib/fonts/glyph-coverage";

/** fontkit (pdfkit's font engine) ships no types; only the two calls used here. */
interface GlyphFont { hasGlyphForCodePoint(cp: number): boolean }
const fontkit = createRequire(import.meta.url)("fontkit") as { create(buf: Buffer): GlyphFont };

describe("safety cautions", () => {
  it("cover solvents, ventilation, respirator, ignition, SDS, blades and heat, and local codes", () => {
    const all = safetyCautionsText().join(" ").toLowerCase();
    for (const word of ["flammable", "ventilation", "organic-vapour respirator", "no flames, pilot lights or sparks", "sds", "cut away from your body", "heat-resistant surface", "cool", "local codes", "licensed practice"]) {
      expect(all).toContain(word);
    }
    expect(SAFETY_CAUTIONS.map((c) => c.id)).toEqual(["adhesive", "tools", "codes"]);
  });

  it("keeps lines short enough for a Letter page and inside the bundled font's glyphs", () => {
    const regular = fontkit.create(jetbrainsMonoRegular());
    const bold = fontkit.create(jetbrainsMonoBold());
    for (const line of [...safetyCautionsText(), SAFETY_REMINDER]) {
      expect(line.length).toBeLessThanOrEqual(130);
      for (const ch of line) {
        expect(regular.hasGlyphForCodePoint(ch.codePointAt(0)!), `glyph for ${JSON.stringify(ch)}`).toBe(true);
        expect(bold.hasGlyphForCodePoint(ch.codePointAt(0)!)).toBe(true);
      }
    }
  });

  it("glyph coverage table matches the bundled TTFs and replaces what they cannot draw", () => {
    const fonts = [fontkit.create(jetbrainsMonoRegular()), fontkit.create(jetbrainsMonoBold())];
    for (const [a, b] of GLYPH_RANGES) for (let cp = a; cp <= b; cp++) for (const f of fonts) expect(f.hasGlyphForCodePoint(cp)).toBe(true);
    expect(printableText("Größe 5°\u2192 \u9f8d\ttab")).toBe("Größe 5°? ? tab");
  });
});
