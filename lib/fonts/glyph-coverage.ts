/**
 * Code points that both bundled JetBrains Mono TTFs (latin subset, 400 and 700) draw, as inclusive ranges.
 * Measured once from the TTF files with fontkit's `hasGlyphForCodePoint` (tests/safety re-checks it against the
 * files). Text outside these ranges would print as blank space in the PDF, so writers replace it with "?".
 */
export const GLYPH_RANGES: readonly (readonly [number, number])[] = [
  [0x20, 0x7e], [0xa0, 0xff], [0x102, 0x102], [0x131, 0x131], [0x152, 0x153], [0x2bc, 0x2bc], [0x2c6, 0x2c6],
  [0x2da, 0x2da], [0x2dc, 0x2dc], [0x300, 0x301], [0x303, 0x304], [0x308, 0x309], [0x323, 0x323], [0x2013, 0x2014],
  [0x2018, 0x201a], [0x201c, 0x201e], [0x2022, 0x2022], [0x2026, 0x2026], [0x2032, 0x2033], [0x2039, 0x203a],
  [0x2044, 0x2044], [0x20ac, 0x20ac], [0x2122, 0x2122], [0x2191, 0x2191], [0x2193, 0x2193], [0x2212, 0x2212],
  [0x2215, 0x2215],
];

export function hasGlyph(cp: number): boolean {
  for (const [a, b] of GLYPH_RANGES) if (cp >= a && cp <= b) return true;
  return false;
}

/** The text with characters the font cannot draw replaced by "?" (control characters and tabs by a space). */
export function printableText(s: string): string {
  let out = "";
  for (const ch of s.normalize("NFC")) {
    const cp = ch.codePointAt(0)!;
    out += hasGlyph(cp) ? ch : cp < 0x20 || cp === 0x7f ? " " : "?";
  }
  return out;
}
