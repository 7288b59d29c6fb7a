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
 * @returns perm with perm[newIndex] = oldIndex
 */
export function nestedDissection(n: number, ptr: Uint32Array, adj: Uint32Array): Uint32Array {
  const LEAF = 48;
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
    for (let i = 0; i < m; i++) tag[verts[i]] = -1;
    dissect(Int32Array.from(a));
    dissect(Int32Array.from(b));
    for (const v of s) perm[out++] = v;
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
