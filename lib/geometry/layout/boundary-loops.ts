/**
 * Boundary loops of a triangle mesh: chains of directed edges u→v whose twin v→u belongs to no face. With faces
 * counter-clockwise (seen from outside, and in a flattening that keeps orientation), each loop has the surface on
 * its left: the outer boundary of a disk runs counter-clockwise.
 */

/**
 * @param triangles    #F×3 local faces
 * @param vertexCount  #V
 * @returns            loops as arrays of vertex ids (not closed: last ≠ first), longest first
 */
export function boundaryLoops(triangles: Uint32Array, vertexCount: number): Uint32Array[] {
  // CSR of outgoing directed edges per vertex, to find twins without a hash map.
  const start = new Uint32Array(vertexCount + 1);
  for (let i = 0; i < triangles.length; i++) start[triangles[i] + 1]++;
  for (let v = 0; v < vertexCount; v++) start[v + 1] += start[v];
  const to = new Uint32Array(triangles.length);
  const fill = new Uint32Array(vertexCount);
  for (let f = 0; f < triangles.length; f += 3) {
    for (let c = 0; c < 3; c++) {
      const u = triangles[f + c], v = triangles[f + ((c + 1) % 3)];
      to[start[u] + fill[u]++] = v;
    }
  }
  const hasEdge = (u: number, v: number): boolean => {
    for (let i = start[u]; i < start[u + 1]; i++) if (to[i] === v) return true;
    return false;
  };
  // boundary edges, with a per-vertex linked list of outgoing boundary edges
  const bFrom: number[] = [], bTo: number[] = [];
  const head = new Int32Array(vertexCount).fill(-1);
  const nextOut: number[] = [];
  for (let u = 0; u < vertexCount; u++) {
    for (let i = start[u]; i < start[u + 1]; i++) {
      const v = to[i];
      if (!hasEdge(v, u)) {
        bFrom.push(u);
        bTo.push(v);
        nextOut.push(head[u]);
        head[u] = bFrom.length - 1;
      }
    }
  }
  const used = new Uint8Array(bFrom.length);
  const loops: Uint32Array[] = [];
  for (let e0 = 0; e0 < bFrom.length; e0++) {
    if (used[e0]) continue;
    const loop: number[] = [];
    let e = e0;
    while (e >= 0 && !used[e]) {
      used[e] = 1;
      loop.push(bFrom[e]);
      const v = bTo[e];
      if (v === bFrom[e0]) break;
      let n = head[v];
      while (n >= 0 && used[n]) n = nextOut[n];
      e = n;
    }
    loops.push(Uint32Array.from(loop));
  }
  loops.sort((a, b) => b.length - a.length);
  return loops;
}

/** Signed area of a closed polygon given by vertex ids into #V×2 coordinates (positive = counter-clockwise). */
export function loopArea(uv: Float64Array, loop: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0, n = loop.length; i < n; i++) {
    const a = loop[i], b = loop[(i + 1) % n];
    s += uv[2 * a] * uv[2 * b + 1] - uv[2 * b] * uv[2 * a + 1];
  }
  return s / 2;
}
