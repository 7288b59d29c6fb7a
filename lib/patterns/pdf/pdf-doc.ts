/**
 * pdfkit document set-up and the text primitive every page uses.
 *
 * Text is always drawn without a width (no line wrapper), so pdfkit never starts a page on its own; wrapping is done
 * here by character count (JetBrains Mono advances 600/1000 em per glyph, measured from the bundled TTF).
 */
import PDFDocument from "pdfkit";
import { jetbrainsMonoBold, jetbrainsMonoRegular } from "@/lib/fonts/font-files";
import { printableText } from "@/lib/fonts/glyph-coverage";

export type Doc = PDFKit.PDFDocument;

/** fontkit applies JetBrains Mono's programming ligatures (`=>`, `!=`) unless these are off. */
const TEXT_FEATURES = { liga: false, calt: false } as unknown as NonNullable<PDFKit.Mixins.TextOptions["features"]>;

/** Glyph advance of JetBrains Mono, em. */
export const MONO_ADVANCE_EM = 0.6;
/** Ascender and cap height of JetBrains Mono, em (unitsPerEm 1000, ascent 1020, capHeight 730). */
const ASCENT_EM = 1.02;
const CAP_EM = 0.73;

export function createDoc(opts: { compress: boolean; title: string; createdAt: Date }): Doc {
  const doc = new PDFDocument({
    autoFirstPage: false,
    bufferPages: true,
    compress: opts.compress,
    margin: 0,
    info: { Title: opts.title, Creator: "Peelform", Producer: "Peelform (pdfkit)", CreationDate: opts.createdAt },
  });
  doc.registerFont("mono", jetbrainsMonoRegular());
  doc.registerFont("mono-bold", jetbrainsMonoBold());
  doc.font("mono-bold");
  cacheShaping(doc);
  doc.font("mono");
  cacheShaping(doc);
  return doc;
}

interface ShapingFont {
  layoutRun?: (text: string, features?: unknown) => unknown;
  __peelformCache?: Map<string, unknown>;
}

/**
 * pdfkit caches glyph runs only when no OpenType features are given, and we must give them (ligatures off), so
 * every label would be shaped by fontkit twice (width, then encoding). This keeps pdfkit's own per-font run cache
 * for our fixed feature set: the same (scaled, read-only) run object pdfkit would cache itself. When pdfkit's
 * internals differ (another version), nothing is patched and text is simply shaped each time.
 */
function cacheShaping(doc: Doc): void {
  const font = (doc as unknown as { _font?: ShapingFont })._font;
  if (!font || typeof font.layoutRun !== "function" || font.__peelformCache) return;
  const original = font.layoutRun.bind(font);
  const cache = new Map<string, unknown>();
  font.__peelformCache = cache;
  font.layoutRun = (t: string, features?: unknown) => {
    if (features !== TEXT_FEATURES) return original(t, features);
    let run = cache.get(t);
    if (run === undefined) { run = original(t, features); cache.set(t, run); }
    return run;
  };
}

export interface TextStyle {
  size: number;
  bold?: boolean;
  color?: string;
  /** horizontal anchor of (x, y) */
  align?: "left" | "center" | "right";
  /** vertical anchor: "top" of the line box (default) or the middle of the capitals */
  valign?: "top" | "middle";
  /** rotation in degrees, counter-clockwise as seen on the page, about (x, y) */
  rotate?: number;
}

/** Width of a string in points at `size`. */
export function textWidth(s: string, size: number): number {
  return [...s].length * MONO_ADVANCE_EM * size;
}

/** Draws one line of text with its anchor at (x, y), page points. */
export function text(doc: Doc, raw: string, x: number, y: number, st: TextStyle): void {
  const s = printableText(raw);
  const w = textWidth(s, st.size);
  const dx = st.align === "center" ? -w / 2 : st.align === "right" ? -w : 0;
  const dy = st.valign === "middle" ? -(ASCENT_EM - CAP_EM / 2) * st.size : 0;
  doc.font(st.bold ? "mono-bold" : "mono").fontSize(st.size).fillColor(st.color ?? "#000000");
  if (st.rotate) {
    doc.save();
    doc.translate(x, y);
    doc.rotate(-st.rotate);
    doc.text(s, dx, dy, { lineBreak: false, features: TEXT_FEATURES });
    doc.restore();
  } else {
    doc.text(s, x + dx, y + dy, { lineBreak: false, features: TEXT_FEATURES });
  }
}

/** Word-wraps `s` to lines of at most `width` points at `size`. */
export function wrap(s: string, width: number, size: number): string[] {
  const max = Math.max(8, Math.floor(width / (MONO_ADVANCE_EM * size)));
  const out: string[] = [];
  let line = "";
  for (const word of s.split(/\s+/)) {
    if (!word) continue;
    if (line && line.length + 1 + word.length > max) { out.push(line); line = word; }
    else line = line ? `${line} ${word}` : word;
    while (line.length > max) { out.push(line.slice(0, max)); line = line.slice(max); }
  }
  if (line) out.push(line);
  return out;
}
