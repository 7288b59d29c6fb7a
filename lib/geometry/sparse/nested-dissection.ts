/**
 * Fill-reducing ordering by nested dissection with breadth-first level-set separators (George 1973, "Nested
 * dissection of a regular finite element mesh"; George & Liu 1981, "Computer Solution of Large Sparse Positive
 * Definite Systems", ch. 8): find a pseudo-peripheral vertex, take the BFS level that splits the vertices in
 * half as separator (trimmed to the vertices that touch the far side), order both halves recursively, then the
 * separator. For planar-like mesh graphs this gives O(n log n) fill and O(n^1.5) factorisation work.
 *
 * @param n number of graph vertices
 * @param ptr n+1 adjacency offsets (CSR; self loops are ignored)
 * @param adj neighbour indices
 * @param coords optional #n×3 vertex coordinates: each level also tries a coordinate bisection (median plane
 *   across the longest bounding-box axis; separator = the far-side vertices touching the near side) and keeps the
 *   smaller of the two separators (geometric nested dissection, Miller, Teng, Thurston & Vavasis 1998)
 * @returns perm with perm[newIndex] = oldIndex
 */
export function nestedDissection(n: number, ptr: Uint32Array, adj: Uint32Array, coords?: Float64Array): Uint32Array {
  const LEAF = 16;
  const perm = new Uint32Array(n);
  let out = 0;
  const tag = new Int32Array(n).fill(-1);
  const level = new Int32Array(n);
  const queue = new Int32Array(n);
  let tagCounter = 0;

  /** BFS from s inside the set tagged t; fills queue[0..count) and level; returns count. */
  const bfs = (s: number, t: number): number => {
    const stamp = -2 - t; // visited marker distinct from any set tag
    let qh = 0, qt = 0;
    queue[qt++] = s; level[s] = 0; tag[s] = stamp;
    while (qh < qt) {
      const v = queue[qh++];
      const lv = level[v] + 1;
      for (let p = ptr[v]; p < ptr[v + 1]; p++) {
        const w = adj[p];
        if (tag[w] !== t) continue;
        tag[w] = stamp; level[w] = lv; queue[qt++] = w;
      }
    }
    for (let i = 0; i < qt; i++) tag[queue[i]] = t; // restore membership
    return qt;
  };

  const useSplit = (verts: Int32Array, g: { a: Int32Array; b: Int32Array; s: Int32Array }): void => {
    for (let i = 0; i < verts.length; i++) tag[verts[i]] = -1;
    dissect(g.a);
    dissect(g.b);
    for (let i = 0; i < g.s.length; i++) perm[out++] = g.s[i];
  };

  const dissect = (verts: Int32Array): void => {
    const m = verts.length;
    if (m <= LEAF) {
      for (let i = 0; i < m; i++) perm[out++] = verts[i];
      return;
    }
    const t = tagCounter++;
    for (let i = 0; i < m; i++) tag[verts[i]] = t;
    let count = bfs(verts[0], t);
    if (count < m) {
      // disconnected: split off this component and recurse on both
      const comp = queue.slice(0, count);
      const rest = new Int32Array(m - count);
      let r = 0;
      const inComp = -3 - 2 * n - t;
      for (let i = 0; i < count; i++) tag[comp[i]] = inComp;
      for (let i = 0; i < m; i++) if (tag[verts[i]] !== inComp) rest[r++] = verts[i];
      for (let i = 0; i < count; i++) tag[comp[i]] = -1;
      for (let i = 0; i < r; i++) tag[rest[i]] = -1;
      dissect(comp);
      dissect(rest);
      return;
    }
    // a coordinate split within the planar-separator bound (2√2·√m, Lipton & Tarjan 1979) is taken at once
    const geo = coords ? coordinateSplit(verts, t) : null;
    if (geo && geo.s.length <= 2.83 * Math.sqrt(m)) {
      useSplit(verts, geo);
      return;
    }
    // pseudo-peripheral start: repeat BFS from the last vertex while the eccentricity grows (at most 4 sweeps)
    let start = queue[count - 1];
    let depth = level[start];
    for (let sweep = 0; sweep < 4; sweep++) {
      count = bfs(start, t);
      const far = queue[count - 1];
      if (level[far] <= depth && sweep > 0) break;
      depth = level[far];
      start = far;
    }
    count = bfs(start, t);
    const maxLevel = level[queue[count - 1]];
    if (maxLevel < 2) {
      for (let i = 0; i < m; i++) { perm[out++] = verts[i]; tag[verts[i]] = -1; }
      return;
    }
    // level whose cumulative count first reaches half
    let sepLevel = 1;
    for (let i = 0; i < count; i++) {
      if (i + 1 >= m / 2) { sepLevel = Math.min(Math.max(level[queue[i]], 1), maxLevel - 1); break; }
    }
    const a: number[] = [], b: number[] = [], s: number[] = [];
    for (let i = 0; i < count; i++) {
      const v = queue[i];
      const lv = level[v];
      if (lv < sepLevel) a.push(v);
      else if (lv > sepLevel) b.push(v);
      else {
        let touchesFar = false;
        for (let p = ptr[v]; p < ptr[v + 1]; p++) {
          const w = adj[p];
          if (tag[w] === t && level[w] === sepLevel + 1) { touchesFar = true; break; }
        }
        if (touchesFar) s.push(v); else a.push(v);
      }
    }
    if (geo && geo.s.length < s.length) {
      useSplit(verts, geo);
      return;
    }
    for (let i = 0; i < m; i++) tag[verts[i]] = -1;
    dissect(Int32Array.from(a));
    dissect(Int32Array.from(b));
    for (const v of s) perm[out++] = v;
  };

  const keys = new Float64Array(n);
  const scratch = new Float64Array(n);
  /** median-plane split of the set tagged t (all members currently carry tag t) */
  const coordinateSplit = (verts: Int32Array, t: number): { a: Int32Array; b: Int32Array; s: Int32Array } | null => {
    const c = coords!;
    const m = verts.length;
    let best = 0, bestExtent = -1;
    for (let ax = 0; ax < 3; ax++) {
      let lo = Infinity, hi = -Infinity;
      for (let i = 0; i < m; i++) { const x = c[3 * verts[i] + ax]; if (x < lo) lo = x; if (x > hi) hi = x; }
      if (hi - lo > bestExtent) { bestExtent = hi - lo; best = ax; }
    }
    if (!(bestExtent > 0)) return null;
    for (let i = 0; i < m; i++) keys[i] = c[3 * verts[i] + best];
    scratch.set(keys.subarray(0, m));
    const median = selectKth(scratch, m, m >> 1);
    const far = -4 - 4 * n - t; // temporary marker for the far side
    for (let i = 0; i < m; i++) if (keys[i] >= median) tag[verts[i]] = far;
    const a: number[] = [], b: number[] = [], s: number[] = [];
    for (let i = 0; i < m; i++) {
      const v = verts[i];
      if (keys[i] < median) { a.push(v); continue; }
      let touches = false;
      for (let p = ptr[v]; p < ptr[v + 1]; p++) if (tag[adj[p]] === t) { touches = true; break; }
      if (touches) s.push(v); else b.push(v);
    }
    for (let i = 0; i < m; i++) tag[verts[i]] = t;
    if (a.length === 0 || b.length === 0) return null;
    return { a: Int32Array.from(a), b: Int32Array.from(b), s: Int32Array.from(s) };
  };

  const all = new Int32Array(n);
  for (let i = 0; i < n; i++) all[i] = i;
  dissect(all);
  return perm;
}

/** Inverse of a permutation: inv[perm[i]] = i. */
export function invertPermutation(perm: Uint32Array): Uint32Array {
  const inv = new Uint32Array(perm.length);
  for (let i = 0; i < perm.length; i++) inv[perm[i]] = i;
  return inv;
}

/** k-th smallest of a[0..m) (Hoare's quickselect, expected O(m)); reorders a. */
function selectKth(a: Float64Array, m: number, k: number): number {
  let lo = 0, hi = m - 1;
  while (lo < hi) {
    const pivot = a[(lo + hi) >> 1];
    let i = lo, j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) { const t = a[i]; a[i] = a[j]; a[j] = t; i++; j--; }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return a[k];
  }
  return a[k];
}
