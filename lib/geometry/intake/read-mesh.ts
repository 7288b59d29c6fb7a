/**
 * Mesh intake: bytes of an OBJ or STL file → welded, cleaned working mesh, its report, and the map from the file's
 * vertex indices to working vertex indices.
 *
 * Index spaces (the contract seam files and the viewer rely on):
 * - OBJ: the working mesh keeps every `v` statement at its file position (0-based). A welded duplicate stays as an
 *   unreferenced entry and `inputToWorking` sends it to its first occurrence; every other vertex maps to itself.
 * - STL: the file has no shared vertices, so the vertex index space is defined by the intake: welded vertices are
 *   numbered in order of first appearance (facet 1 corner 1, corner 2, …). `inputToWorking` is the identity over it.
 * - Decimation keeps the index space: collapsed vertices stay as unreferenced entries.
 * Coordinates are not converted: they stay in the declared `units`.
 *
 * Report counts per format: `inputVertices` = `v` statements (OBJ) or 3 corners per facet (STL); `inputFaces` =
 * `f` statements (OBJ polygons) or facets (STL); `faces` = triangles after welding and cleaning; `weldedVertices` =
 * referenced OBJ vertices merged into an earlier one, or STL corners merged into an earlier corner (3·facets −
 * distinct vertices). Topology counts (components, loops, χ) describe the welded, cleaned mesh before decimation;
 * `decimated` describes the working copy when one was made.
 *
 * Order of work: detect format → parse → weld (tolerance WELD_TOLERANCE_FACTOR × bounding-box diagonal of the
 * referenced vertices) → drop degenerate and duplicate faces → topology → decimate when over the face budget.
 */
import { GeometryError } from "../errors";
import { LENGTH_UNITS, type LengthUnit, type TriMesh } from "../mesh";
import type { MeshReport } from "../report-types";
import { meshTopology } from "../analysis/mesh-topology";
import { cleanTriangles } from "./clean-triangles";
import { decimateToBudget } from "./decimate";
import { detectFormat } from "./detect-format";
import { parseObj } from "./parse-obj";
import { parseAsciiStl } from "./parse-stl-ascii";
import { parseBinaryStl } from "./parse-stl-binary";
import { WELD_TOLERANCE_FACTOR, weldVertices } from "./weld-vertices";

export interface IntakeResult {
  /** the working mesh (decimated when the input was over the face budget), in `report.units` */
  mesh: TriMesh;
  report: MeshReport;
  /** input-file vertex index → working vertex index (see the module comment for what "input index" means per format) */
  inputToWorking: Uint32Array;
}

export interface ReadMeshOptions {
  /** length unit the file's coordinates are in (declared by the user; files carry none) */
  units: LengthUnit;
  /** faces above which a decimated working copy is made; default DEFAULT_FACE_BUDGET */
  faceBudget?: number;
}

export const DEFAULT_FACE_BUDGET = 200_000;

/**
 * Reads an OBJ, ASCII STL or binary STL (detected by content). Throws GeometryError for every bad input.
 * @param bytes  the whole file
 */
export async function readMesh(bytes: Uint8Array, opts: ReadMeshOptions): Promise<IntakeResult> {
  if (!opts || !LENGTH_UNITS.includes(opts.units)) {
    throw new GeometryError("BAD_PARAMETER", `Units must be one of ${LENGTH_UNITS.join(", ")}, not "${String(opts?.units)}".`);
  }
  const faceBudget = opts.faceBudget ?? DEFAULT_FACE_BUDGET;
  if (!Number.isInteger(faceBudget) || faceBudget < 1) {
    throw new GeometryError("BAD_PARAMETER", `The face budget must be a whole number of at least 1, not ${String(opts.faceBudget)}.`);
  }
  if (!(bytes instanceof Uint8Array)) {
    throw new GeometryError("BAD_PARAMETER", "The mesh data must be a Uint8Array of the file's bytes.");
  }

  const format = detectFormat(bytes);
  let positions: Float64Array;
  let triangles: Uint32Array;
  let inputToWorking: Uint32Array;
  let inputVertices: number;
  let inputFaces: number;
  let weldedVertices: number;
  let tolerance: number;
  let inputBounds: Bounds;

  if (format === "obj") {
    const obj = parseObj(bytes);
    if (obj.polygonCount === 0) {
      throw new GeometryError("NO_FACES", `The OBJ file has ${obj.vertexCount} vertices but no faces ('f' statements), so there is no surface to read.`);
    }
    positions = obj.positions;
    triangles = obj.triangles;
    inputVertices = obj.vertexCount;
    inputFaces = obj.polygonCount;
    const referenced = new Uint8Array(obj.vertexCount);
    for (let k = 0; k < triangles.length; k++) referenced[triangles[k]] = 1;
    inputBounds = boundsOf(positions, referenced);
    tolerance = WELD_TOLERANCE_FACTOR * inputBounds.diagonal;
    const weld = weldVertices(positions, referenced, tolerance);
    inputToWorking = weld.representative;
    weldedVertices = weld.welded;
    for (let k = 0; k < triangles.length; k++) triangles[k] = inputToWorking[triangles[k]];
  } else {
    let stl: { corners: Float64Array; faceCount: number };
    let facets: number;
    if (format === "stl-binary") {
      stl = parseBinaryStl(bytes);
      facets = stl.faceCount;
    } else {
      const ascii = parseAsciiStl(bytes);
      stl = ascii;
      facets = ascii.facetCount;
    }
    if (stl.faceCount === 0) {
      throw new GeometryError("NO_FACES", `The ${format === "stl-binary" ? "binary" : "ASCII"} STL has no facets, so there is no surface to read.`);
    }
    const corners = stl.corners;
    const cornerCount = corners.length / 3;
    inputVertices = cornerCount;
    inputFaces = facets;
    inputBounds = boundsOf(corners, null);
    tolerance = WELD_TOLERANCE_FACTOR * inputBounds.diagonal;
    const weld = weldVertices(corners, null, tolerance);
    // Number distinct vertices in order of first appearance, in one pass (a representative precedes its copies).
    const unique = cornerCount - weld.welded;
    const representative = weld.representative;
    positions = new Float64Array(3 * unique);
    triangles = new Uint32Array(cornerCount); // corner c of facet f is 3f + c, so the corner order is the face order
    let next = 0;
    for (let c = 0; c < cornerCount; c++) {
      const r = representative[c];
      if (r === c) {
        positions[3 * next] = corners[3 * c];
        positions[3 * next + 1] = corners[3 * c + 1];
        positions[3 * next + 2] = corners[3 * c + 2];
        triangles[c] = next++;
      } else {
        triangles[c] = triangles[r];
      }
    }
    inputToWorking = new Uint32Array(unique);
    for (let v = 0; v < unique; v++) inputToWorking[v] = v;
    weldedVertices = weld.welded;
  }

  const diagonal = tolerance / WELD_TOLERANCE_FACTOR;
  const clean = cleanTriangles(positions, triangles, diagonal);
  if (clean.triangles.length === 0) {
    const total = triangles.length / 3;
    throw new GeometryError(
      "ONLY_DEGENERATE_FACES",
      `All ${total} face${total === 1 ? " is" : "s are"} degenerate (a repeated vertex or zero area once vertices closer than ${formatLength(tolerance)} ${opts.units} are welded), so there is no surface to read.`,
    );
  }
  const vertexCount = positions.length / 3;
  const topology = meshTopology(clean.triangles, vertexCount);
  // Welding moves no point, it only drops copies within the weld tolerance, so the input box stands (to within that
  // tolerance) unless cleaning dropped faces; then it is measured again on the vertices still in use.
  const bounds =
    clean.droppedDegenerate + clean.droppedDuplicate === 0 ? inputBounds : boundsOf(positions, referencedFlags(clean.triangles, vertexCount));

  let working = clean.triangles;
  let decimated: MeshReport["decimated"] = null;
  const faces = clean.triangles.length / 3;
  if (faces > faceBudget) {
    const center: [number, number, number] = [
      (bounds.min[0] + bounds.max[0]) / 2,
      (bounds.min[1] + bounds.max[1]) / 2,
      (bounds.min[2] + bounds.max[2]) / 2,
    ];
    const result = await decimateToBudget(positions, clean.triangles, faceBudget, center);
    working = cleanTriangles(positions, result.triangles, diagonal).triangles;
    if (working.length === 0) {
      throw new GeometryError("BAD_PARAMETER", `The face budget of ${faceBudget} is too small: decimating ${faces} faces to it left no surface.`);
    }
    decimated = {
      faceBudget,
      originalFaces: faces,
      workingFaces: working.length / 3,
      workingVertices: countReferenced(working, vertexCount),
      maxError: result.maxError,
    };
  }

  const report: MeshReport = {
    format,
    units: opts.units,
    inputVertices,
    inputFaces,
    vertices: topology.referencedVertices,
    faces,
    weldedVertices,
    droppedDegenerateFaces: clean.droppedDegenerate,
    droppedDuplicateFaces: clean.droppedDuplicate,
    components: topology.components,
    boundaryLoops: topology.boundaryLoops,
    nonManifoldEdges: topology.nonManifoldEdges,
    eulerCharacteristic: topology.eulerCharacteristic,
    bbox: {
      min: bounds.min,
      max: bounds.max,
      size: [bounds.max[0] - bounds.min[0], bounds.max[1] - bounds.min[1], bounds.max[2] - bounds.min[2]],
    },
    decimated,
  };
  return { mesh: { positions, triangles: working }, report, inputToWorking };
}

interface Bounds {
  min: [number, number, number];
  max: [number, number, number];
  diagonal: number;
}

/** Bounding box of the points flagged in `include` (all points when it is null). */
function boundsOf(positions: Float64Array, include: Uint8Array | null): Bounds {
  let x0 = Infinity, y0 = Infinity, z0 = Infinity, x1 = -Infinity, y1 = -Infinity, z1 = -Infinity;
  const count = positions.length / 3;
  let n = 0;
  for (let v = 0; v < count; v++) {
    if (include !== null && include[v] === 0) continue;
    n++;
    const x = positions[3 * v], y = positions[3 * v + 1], z = positions[3 * v + 2];
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
    if (z < z0) z0 = z;
    if (z > z1) z1 = z;
  }
  if (n === 0) return { min: [0, 0, 0], max: [0, 0, 0], diagonal: 0 };
  return { min: [x0, y0, z0], max: [x1, y1, z1], diagonal: Math.hypot(x1 - x0, y1 - y0, z1 - z0) };
}

function referencedFlags(triangles: Uint32Array, vertexCount: number): Uint8Array {
  const flags = new Uint8Array(vertexCount);
  for (let k = 0; k < triangles.length; k++) flags[triangles[k]] = 1;
  return flags;
}

function countReferenced(triangles: Uint32Array, vertexCount: number): number {
  const seen = new Uint8Array(vertexCount);
  let count = 0;
  for (let k = 0; k < triangles.length; k++) {
    if (seen[triangles[k]] === 0) {
      seen[triangles[k]] = 1;
      count++;
    }
  }
  return count;
}

function formatLength(x: number): string {
  if (x === 0) return "0";
  return x < 1e-3 || x >= 1e6 ? x.toExponential(1) : String(Number(x.toPrecision(2)));
}
