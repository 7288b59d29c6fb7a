/**
 * Seam files and seam resolution: `{"seams": [[i, j], …]}` in input-file vertex indices (0-based) → working-mesh
 * edge list. Each pair must be an edge of the working mesh after welding (and after decimation, when it was made).
 */
import { GeometryError } from "../errors";
import { buildEdgeTable, findEdge } from "../analysis/edge-table";
import type { IntakeResult } from "../intake/read-mesh";
import { findJsonSyntaxError } from "./json-syntax-error";
import { seamsFileSchema } from "./seams-schema";

/**
 * Parses and validates seam JSON. Throws GeometryError BAD_SEAMS naming the line and column of a syntax error, or the
 * element (e.g. `seams[3][1]`) and why it is wrong.
 * @returns the pairs in file order
 */
export function parseSeamsJson(text: string): [number, number][] {
  if (typeof text !== "string" || text.trim() === "") {
    throw new GeometryError("BAD_SEAMS", 'The seam file is empty; expected JSON like {"seams": [[0, 1], [1, 2]]}.');
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    const problem = findJsonSyntaxError(text);
    const where = problem ? `line ${problem.line}, column ${problem.column}: ${problem.detail}` : "a syntax error";
    throw new GeometryError("BAD_SEAMS", `The seam file is not valid JSON (${where}).`, problem ? { line: problem.line } : {});
  }
  const result = seamsFileSchema.safeParse(data);
  if (!result.success) {
    const issue = result.error.issues[0];
    const path = issue.path.length === 0 ? "the top level" : formatPath(issue.path);
    const message =
      issue.path.length === 0
        ? `The seam file must be a JSON object with a "seams" array, like {"seams": [[0, 1]]}.`
        : issue.code === "invalid_type" && issue.path.length === 1 && issue.path[0] === "seams" && (data as Record<string, unknown>)?.seams === undefined
          ? `The seam file has no "seams" array; expected {"seams": [[i, j], …]}.`
          : `In the seam file, ${path} ${issue.message}${describeValue(data, issue.path)}.`;
    throw new GeometryError("BAD_SEAMS", message);
  }
  return result.data.seams.map(([i, j]) => [i, j] as [number, number]);
}

/**
 * Maps input-file vertex pairs to working vertex pairs and checks each is an edge of the working mesh.
 * Repeated edges (in either direction) are kept once.
 * @returns Uint32Array of 2 per seam edge, working vertex ids, in list order
 */
export function resolveSeams(pairs: readonly (readonly [number, number])[], intake: IntakeResult): Uint32Array {
  const { mesh, inputToWorking, report } = intake;
  const vertexCount = mesh.positions.length / 3;
  const table = buildEdgeTable(mesh.triangles, vertexCount);
  const seen = new Uint8Array(table.edgeCount);
  const out = new Uint32Array(2 * pairs.length);
  let w = 0;
  const inputCount = inputToWorking.length;
  for (let k = 0; k < pairs.length; k++) {
    const [i, j] = pairs[k];
    const label = `Seam ${k + 1} of ${pairs.length} ([${i}, ${j}])`;
    for (const v of [i, j]) {
      if (!Number.isInteger(v) || v < 0 || v >= inputCount) {
        throw new GeometryError(
          "INDEX_OUT_OF_RANGE",
          `${label} uses vertex ${v}, which is out of range: the input file has ${inputCount} vertices, numbered 0 to ${inputCount - 1}.`,
        );
      }
    }
    const a = inputToWorking[i], b = inputToWorking[j];
    if (a === b) {
      throw new GeometryError(
        "SEAM_NOT_AN_EDGE",
        i === j
          ? `${label} joins a vertex to itself, which is not an edge.`
          : `${label} is not an edge: vertices ${i} and ${j} are the same point and were welded into one vertex.`,
      );
    }
    const e = findEdge(table, a, b);
    if (e < 0) {
      const removed = report.decimated !== null && (!touches(table, a) || !touches(table, b));
      throw new GeometryError(
        "SEAM_NOT_AN_EDGE",
        removed
          ? `${label} is not an edge of the working mesh: the scan was decimated to ${report.decimated!.workingFaces} faces and a vertex of this pair was removed; draw seams on the working mesh.`
          : `${label} is not an edge of the mesh: no face has vertices ${i} and ${j} as neighbours.`,
      );
    }
    if (seen[e] === 1) continue;
    seen[e] = 1;
    out[w++] = a;
    out[w++] = b;
  }
  return out.slice(0, w);
}

/** True when vertex v is on at least one edge. */
function touches(table: ReturnType<typeof buildEdgeTable>, v: number): boolean {
  if (table.vertexEdgeStart[v + 1] > table.vertexEdgeStart[v]) return true;
  for (let e = 0; e < table.edgeCount; e++) if (table.edgeHi[e] === v) return true;
  return false;
}

function formatPath(path: readonly PropertyKey[]): string {
  let s = "";
  for (const p of path) s += typeof p === "number" ? `[${p}]` : s === "" ? String(p) : `.${String(p)}`;
  return s;
}

function describeValue(data: unknown, path: readonly PropertyKey[]): string {
  let v: unknown = data;
  for (const p of path) {
    if (v === null || typeof v !== "object") return "";
    v = (v as Record<PropertyKey, unknown>)[p];
  }
  if (v === undefined) return "";
  let text: string | undefined;
  try {
    text = JSON.stringify(v);
  } catch {
    return ""; // nesting too deep to print
  }
  return text === undefined ? "" : ` (found ${text.length > 40 ? text.slice(0, 37) + "..." : text})`;
}
