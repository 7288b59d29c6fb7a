/**
 * Seam set ⇄ `{ "seams": [[i, j], …] }`, the body of PUT /api/scans/[id]/seams and of a seam file (vertex index
 * pairs of the viewer mesh, which keeps the working mesh's numbering; see lib/scans/mesh-binary.ts).
 *
 * Loading groups the pairs back into runs: maximal chains through vertices where exactly two seam edges meet,
 * started in file order, so a saved set reloads with the same runs unless runs were drawn touching each other.
 */
import { GeometryError } from "@/lib/geometry/errors";
import { parseSeamsJson } from "@/lib/geometry/seams/parse-seams";
import type { SeamSet } from "./seam-set";
import { edgeBetween, type StudioMesh } from "./studio-mesh";

export interface SeamsJson {
  seams: [number, number][];
}

/** The JSON body for saving. */
export function seamSetToJson(set: SeamSet): SeamsJson {
  return { seams: set.seamPairs() };
}

/**
 * Vertex chains (runs) of a list of seam pairs.
 * @throws GeometryError INDEX_OUT_OF_RANGE / SEAM_NOT_AN_EDGE naming the pair, as the API does
 */
export function chainsFromPairs(sm: StudioMesh, pairs: readonly (readonly [number, number])[]): Uint32Array[] {
  const nv = sm.vertexCount;
  const onSeam = new Uint8Array(sm.edgeCount);
  const order: number[] = [];
  const firstFrom = new Uint32Array(sm.edgeCount); // endpoint the file listed first, per edge
  for (let k = 0; k < pairs.length; k++) {
    const [i, j] = pairs[k];
    const label = `Seam ${k + 1} of ${pairs.length} ([${i}, ${j}])`;
    for (const v of [i, j]) {
      if (!Number.isInteger(v) || v < 0 || v >= nv) {
        throw new GeometryError("INDEX_OUT_OF_RANGE", `${label} uses vertex ${v}, which is out of range: the mesh has ${nv} vertices, numbered 0 to ${nv - 1}.`);
      }
    }
    const e = i === j ? -1 : edgeBetween(sm, i, j);
    if (e < 0) throw new GeometryError("SEAM_NOT_AN_EDGE", `${label} is not an edge of the mesh: no face has vertices ${i} and ${j} as neighbours.`);
    if (!onSeam[e]) { onSeam[e] = 1; order.push(e); firstFrom[e] = i; }
  }
  const degree = new Uint32Array(nv);
  for (const e of order) { degree[sm.edgeLo[e]]++; degree[sm.edgeHi[e]]++; }
  const used = new Uint8Array(sm.edgeCount);
  const { vertexEdgeOffsets: off, vertexEdges: ved, vertexNeighbors: nbr } = sm;
  /** Walks from v away along unused seam edges while v has seam degree 2; returns the vertices after v. */
  const walk = (v: number, stop: number): number[] => {
    const out: number[] = [];
    while (degree[v] === 2 && v !== stop) {
      let next = -1;
      for (let q = off[v]; q < off[v + 1]; q++) {
        const e = ved[q];
        if (onSeam[e] && !used[e]) { used[e] = 1; next = nbr[q]; break; }
      }
      if (next < 0) break;
      out.push(next);
      v = next;
    }
    return out;
  };
  const chains: Uint32Array[] = [];
  for (const e of order) {
    if (used[e]) continue;
    used[e] = 1;
    const a = firstFrom[e], b = a === sm.edgeLo[e] ? sm.edgeHi[e] : sm.edgeLo[e];
    const forward = walk(b, a);
    const closed = forward.length > 0 && forward[forward.length - 1] === a;
    const backward = closed ? [] : walk(a, -1);
    chains.push(Uint32Array.from([...backward.reverse(), a, b, ...forward]));
  }
  return chains;
}

/**
 * Parses seam JSON text (a seam file or a saved version) and loads it into the set as a fresh start.
 * @throws GeometryError BAD_SEAMS with the line/element, or the pair errors of chainsFromPairs
 */
export function loadSeamsJson(set: SeamSet, text: string): void {
  set.reset(chainsFromPairs(set.sm, parseSeamsJson(text)));
}

/** Loads pairs already parsed (e.g. the `seams` of GET /api/scans/[id]/seams) as a fresh start. */
export function loadSeamPairs(set: SeamSet, pairs: readonly (readonly [number, number])[]): void {
  set.reset(chainsFromPairs(set.sm, pairs));
}
