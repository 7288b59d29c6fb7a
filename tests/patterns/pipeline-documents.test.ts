/**
 * The document writers on reports made by the real geometry pipeline (readMesh → flattenMesh), so the writers and
 * the report contract cannot drift apart.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { flattenMesh } from "@/lib/geometry/pipeline/flatten-mesh";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import type { TriMesh } from "@/lib/geometry/mesh";
import { renderPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import { renderPatternSvg } from "@/lib/patterns/render-pattern-svg";
import type { PatternInput } from "@/lib/patterns/pattern-input";
import { bbox, readPdfPages, strokedPolygons } from "./pdf-ops";

const PT_PER_MM = 72 / 25.4; // Source: ISO 32000-1 §8.3.2.3 (1/72 in) and 1 in = 25.4 mm.

async function patternOf(mesh: TriMesh, seams: number[], opts: Parameters<typeof flattenMesh>[2]): Promise<PatternInput> {
  const intake = await readMesh(new TextEncoder().encode(writeObj(mesh)), { units: "mm" });
  const res = flattenMesh(intake, new Uint32Array(seams), opts);
  return {
    report: res.report,
    meta: { projectName: "Pipeline check", scanName: "shape.obj", material: "eva", thicknessMm: 6, createdAt: new Date("2026-12-01T00:00:00Z") },
    assembly: { positions: intake.mesh.positions, triangles: intake.mesh.triangles, facePiece: res.facePiece, labels: res.report.pieces.map((p) => p.label) },
  };
}

describe("documents from flattenMesh reports", () => {
  it("a seamed tube's piece is drawn at the report's size in the PDF and the SVG (within 0.1 mm)", async () => {
    const segments = 48, bands = 4;
    const mesh = cylinderTube({ radius: 40, height: 100, segments, bands });
    const seams: number[] = [];
    for (let i = 0; i < bands; i++) seams.push(i * segments, (i + 1) * segments);
    const inp = await patternOf(mesh, seams, { thickness: 6, scanFace: "outer" });
    const piece = inp.report.pieces[0];
    expect(piece.flattenable).toBe(true);
    const xs = piece.outline.map((p) => p[0]), ys = piece.outline.map((p) => p[1]);
    const w = Math.max(...xs) - Math.min(...xs), h = Math.max(...ys) - Math.min(...ys);

    const pages = readPdfPages(await renderPatternPdf(inp, { paper: "tabloid", compress: false }));
    const outline = strokedPolygons(pages[pages.length - 1], piece.outline.length).map(bbox);
    expect(outline.length).toBeGreaterThanOrEqual(1);
    expect(Math.abs(outline[0].w / PT_PER_MM - w)).toBeLessThan(0.1);
    expect(Math.abs(outline[0].h / PT_PER_MM - h)).toBeLessThan(0.1);

    const svg = renderPatternSvg(inp);
    const d = svg.match(/<path id="A-outline"[^>]* d="([^"]+)"/)![1];
    const pts = [...d.matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(Math.abs(Math.max(...pts.map((p) => p[0])) - Math.min(...pts.map((p) => p[0])) - w)).toBeLessThan(0.1);
    expect(Math.abs(Math.max(...pts.map((p) => p[1])) - Math.min(...pts.map((p) => p[1])) - h)).toBeLessThan(0.1);
  });

  it("a mirrored cube: the count-0 twin is not drawn and the cover says whose mirrored copy it is", async () => {
    const m = cube({ size: 100 });
    const edges: number[] = [];
    for (let a = 0; a < 8; a++) for (const bit of [4, 2, 1]) if (!(a & bit)) edges.push(a, a | bit);
    const inp = await patternOf(m, edges, { mirror: { axis: "x", offset: 0 } });
    const twin = inp.report.pieces.find((p) => p.count === 0)!;
    const main = inp.report.pieces.find((p) => p.count === 2)!;
    const svg = renderPatternSvg(inp);
    expect(svg).not.toContain(`<g id="${twin.label}" class="piece"`);
    expect(svg).toContain(`<g id="${main.label}" class="piece"`);
    const pdf = await renderPatternPdf(inp, { paper: "full", compress: false });
    const pages = readPdfPages(pdf);
    // One full-size page: the five drawn squares (the 2-count one included) and not the twin, which the layout
    // leaves at the origin on top of another piece.
    const quads = strokedPolygons(pages[pages.length - 1], 4).map(bbox).filter((b) => Math.abs(b.w / PT_PER_MM - 100) < 0.5);
    expect(quads).toHaveLength(5);
    const file = path.join(mkdtempSync(path.join(tmpdir(), "peelform-mirror-")), "cube.pdf");
    writeFileSync(file, pdf);
    const cover = execFileSync("pdftotext", ["-raw", "-f", "1", "-l", "1", file, "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
    expect(cover).toContain(`Piece ${twin.label} is not drawn: it is cut as the mirrored copy of ${main.label}`);
    expect(cover).toContain(`mirror copy of ${main.label}`);
  });
});
