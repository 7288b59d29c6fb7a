import type { MeshReport } from "@/lib/geometry/report-types";

const n = (x: number) => x.toLocaleString("en-GB");
const plural = (x: number, one: string, many: string) => `${n(x)} ${x === 1 ? one : many}`;
const FORMAT = { obj: "an OBJ", "stl-ascii": "a text STL", "stl-binary": "a binary STL" } as const;

export interface IntakeLine {
  text: string;
  /** "ok" reads well, "note" is worth knowing, "warn" may stop a piece from flattening */
  tone: "ok" | "note" | "warn";
}

/** The intake report in plain words: what was read, what was cleaned, and what may need fixing before seams. */
export function describeIntake(r: MeshReport): IntakeLine[] {
  const lines: IntakeLine[] = [];
  const [sx, sy, sz] = r.bbox.size;
  const round = (v: number) => (Math.round(v * 10) / 10).toLocaleString("en-GB");
  lines.push({ tone: "ok", text: `Read ${plural(r.inputVertices, "vertex", "vertices")} and ${plural(r.inputFaces, "face", "faces")} from ${FORMAT[r.format]} file; the working mesh has ${plural(r.vertices, "vertex", "vertices")} and ${plural(r.faces, "face", "faces")}.` });
  lines.push({ tone: "ok", text: `Size ${round(sx)} × ${round(sy)} × ${round(sz)} ${r.units}.` });
  const cleaned: string[] = [];
  if (r.weldedVertices) cleaned.push(`joined ${plural(r.weldedVertices, "duplicate vertex", "duplicate vertices")}`);
  if (r.droppedDegenerateFaces) cleaned.push(`dropped ${plural(r.droppedDegenerateFaces, "face with no area", "faces with no area")}`);
  if (r.droppedDuplicateFaces) cleaned.push(`dropped ${plural(r.droppedDuplicateFaces, "repeated face", "repeated faces")}`);
  if (cleaned.length) lines.push({ tone: "note", text: `Cleaned up: ${cleaned.join(", ")}.` });
  lines.push(
    r.components === 1
      ? { tone: "ok", text: "One connected part." }
      : { tone: "note", text: `${n(r.components)} separate parts (each becomes its own piece or pieces).` },
  );
  lines.push(
    r.boundaryLoops === 0
      ? { tone: "ok", text: "Closed surface: no holes. It needs at least one seam to open it flat." }
      : { tone: "note", text: `${plural(r.boundaryLoops, "hole", "holes")} (open edge loop${r.boundaryLoops === 1 ? "" : "s"}): the edges of an open shell, or gaps in the scan.` },
  );
  lines.push(
    r.nonManifoldEdges === 0
      ? { tone: "ok", text: "No non-manifold edges." }
      : { tone: "warn", text: `${plural(r.nonManifoldEdges, "non-manifold edge", "non-manifold edges")} (more than two faces meet there); pieces touching them may not flatten, so repair the mesh if you can.` },
  );
  if (r.decimated) {
    lines.push({
      tone: "note",
      text: `Simplified from ${n(r.decimated.originalFaces)} to ${n(r.decimated.workingFaces)} faces to stay within ${n(r.decimated.faceBudget)}; the surface moved at most ${round(r.decimated.maxError)} ${r.units}.`,
    });
  }
  return lines;
}
