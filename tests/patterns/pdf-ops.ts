/**
 * A small reader for uncompressed PDFs written by pdfkit (`compress: false`): finds the pages in /Kids order and
 * interprets their content streams' path operators under the current transformation matrix.
 * Source: ISO 32000-1:2008 §8.4.4 (q, Q, cm), §8.5.2 (m, l, c, v, y, h, re), §8.5.3 (S, s, f, F, f*, B, B*, b, b*, n),
 * §7.8 (content streams), and §8.3.4: a point transforms as [x y 1] × CTM.
 */
export type Pt = [number, number];

export interface DrawnPath {
  /** subpaths, points in default user space (points, origin bottom-left) */
  subpaths: Pt[][];
  /** true where the subpath came from `re` */
  rects: boolean[];
  paint: string;
}

export interface PdfPage {
  width: number;
  height: number;
  paths: DrawnPath[];
}

type M = [number, number, number, number, number, number];
const mul = (a: M, b: M): M => [
  a[0] * b[0] + a[1] * b[2], a[0] * b[1] + a[1] * b[3],
  a[2] * b[0] + a[3] * b[2], a[2] * b[1] + a[3] * b[3],
  a[4] * b[0] + a[5] * b[2] + b[4], a[4] * b[1] + a[5] * b[3] + b[5],
];
const apply = (m: M, x: number, y: number): Pt => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

function tokenize(s: string): string[] {
  const out: string[] = [];
  let i = 0;
  while (i < s.length) {
    const c = s[i];
    if (/\s/.test(c)) { i++; continue; }
    if (c === "%") { while (i < s.length && s[i] !== "\n") i++; continue; }
    if (c === "(") {
      let depth = 0, j = i;
      for (; j < s.length; j++) {
        if (s[j] === "\\") { j++; continue; }
        if (s[j] === "(") depth++;
        else if (s[j] === ")") { depth--; if (depth === 0) break; }
      }
      out.push("(str)"); i = j + 1; continue;
    }
    if (c === "<" && s[i + 1] !== "<") { const j = s.indexOf(">", i); out.push("<hex>"); i = j + 1; continue; }
    if (c === "[" || c === "]") { out.push(c); i++; continue; }
    let j = i;
    while (j < s.length && !/[\s()[\]<>]/.test(s[j])) j++;
    if (j === i) j = i + 1;
    out.push(s.slice(i, j));
    i = j;
  }
  return out;
}

function interpret(content: string): DrawnPath[] {
  const paths: DrawnPath[] = [];
  let ctm: M = [1, 0, 0, 1, 0, 0];
  const stack: M[] = [];
  let operands: number[] = [];
  let sub: Pt[][] = [];
  let rects: boolean[] = [];
  let cur: Pt[] | null = null;
  const paintOps = new Set(["S", "s", "f", "F", "f*", "B", "B*", "b", "b*", "n"]);
  let inText = false;
  for (const t of tokenize(content)) {
    if (/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) { operands.push(Number(t)); continue; }
    if (t === "BT") inText = true;
    else if (t === "ET") inText = false;
    else if (inText) { /* text operators are not paths */ }
    else if (t === "q") stack.push(ctm);
    else if (t === "Q") ctm = stack.pop() ?? [1, 0, 0, 1, 0, 0];
    else if (t === "cm") ctm = mul(operands.slice(-6) as M, ctm);
    else if (t === "m") { const [x, y] = operands.slice(-2); cur = [apply(ctm, x, y)]; sub.push(cur); rects.push(false); }
    else if (t === "l") { const [x, y] = operands.slice(-2); cur?.push(apply(ctm, x, y)); }
    else if (t === "c") { const [x, y] = operands.slice(-2); cur?.push(apply(ctm, x, y)); }
    else if (t === "v" || t === "y") { const [x, y] = operands.slice(-2); cur?.push(apply(ctm, x, y)); }
    else if (t === "re") {
      const [x, y, w, h] = operands.slice(-4);
      sub.push([apply(ctm, x, y), apply(ctm, x + w, y), apply(ctm, x + w, y + h), apply(ctm, x, y + h)]);
      rects.push(true); cur = null;
    } else if (t === "h") { /* close: subpath already holds its points */ }
    else if (paintOps.has(t)) {
      if (t !== "n") paths.push({ subpaths: sub, rects, paint: t });
      sub = []; rects = []; cur = null;
    }
    if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) operands = [];
  }
  return paths;
}

/** Pages of an uncompressed pdfkit PDF, in reading order, with their painted paths. */
export function readPdfPages(pdf: Buffer): PdfPage[] {
  const s = pdf.toString("latin1");
  const objects = new Map<number, string>();
  const re = /(\d+) 0 obj\s([\s\S]*?)\bendobj/g;
  for (let m = re.exec(s); m; m = re.exec(s)) objects.set(Number(m[1]), m[2]);
  const pagesObj = [...objects.values()].find((o) => /\/Type \/Pages/.test(o));
  if (!pagesObj) throw new Error("no /Pages object");
  const kids = [...(pagesObj.match(/\/Kids \[([^\]]*)\]/)?.[1] ?? "").matchAll(/(\d+) 0 R/g)].map((k) => Number(k[1]));
  return kids.map((id) => {
    const page = objects.get(id) ?? "";
    const box = (page.match(/\/MediaBox \[([^\]]*)\]/)?.[1] ?? "").trim().split(/\s+/).map(Number);
    const contentsId = Number(page.match(/\/Contents (\d+) 0 R/)?.[1]);
    const obj = objects.get(contentsId) ?? "";
    if (/\/Filter/.test(obj.split("stream")[0])) throw new Error("content stream is compressed: render with compress: false");
    const start = obj.indexOf("stream") + "stream".length;
    const end = obj.lastIndexOf("endstream");
    return { width: box[2] - box[0], height: box[3] - box[1], paths: interpret(obj.slice(start, end)) };
  });
}

export function bbox(pts: Pt[]): { minX: number; minY: number; maxX: number; maxY: number; w: number; h: number } {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y] of pts) { minX = Math.min(minX, x); maxX = Math.max(maxX, x); minY = Math.min(minY, y); maxY = Math.max(maxY, y); }
  return { minX, minY, maxX, maxY, w: maxX - minX, h: maxY - minY };
}

/** Stroked rectangles (`re` … S) of a page, as boxes in points. */
export function strokedRects(page: PdfPage) {
  const out: ReturnType<typeof bbox>[] = [];
  for (const p of page.paths) if (p.paint === "S" || p.paint === "s") p.subpaths.forEach((sp, i) => { if (p.rects[i]) out.push(bbox(sp)); });
  return out;
}

/** Stroked polygons built with m/l (not `re`) with exactly `n` points. */
export function strokedPolygons(page: PdfPage, n: number) {
  const out: Pt[][] = [];
  for (const p of page.paths) if (p.paint === "S" || p.paint === "s") p.subpaths.forEach((sp, i) => { if (!p.rects[i] && sp.length === n) out.push(sp); });
  return out;
}
