/**
 * Welding: vertices closer than a tolerance become one vertex, the earliest in input order.
 *
 * Spatial hashing on a grid of cubic cells of edge CELL_FACTOR·tolerance, stored in an open-addressing hash table
 * (linear probing) keyed by integer cell coordinates. A point is compared only with representatives in its own cell
 * and in neighbouring cells it lies within `tolerance` of, so the cost is O(n) expected, never O(n²).
 * The merge is greedy against representatives (a point joins the earliest representative within tolerance), which
 * makes the result deterministic and independent of hash layout.
 */

/**
 * Weld tolerance as a fraction of the bounding-box diagonal: 1e-6 (0.1 µm on a 100 mm sculpt). Float32 STL
 * coordinates carry a relative rounding error of 2^-24 ≈ 6e-8 (Source: IEEE 754 binary32, 24-bit significand), so
 * copies of one vertex written by different code paths agree to well within it, while the finest detail a scan of a
 * sculpt resolves (≈ 1e-4 of its size) stays two orders of magnitude above it. Relative, so welding does not change
 * when a mesh is scaled or moved.
 */
export const WELD_TOLERANCE_FACTOR = 1e-6;

/** Entries of the exact-copy cache (power of two; 16 Ki × 28 bytes stays in a core's L2 cache). */
const EXACT_CACHE_SIZE = 1 << 14;

/**
 * Most representatives one point is compared with. Only a pathological layout reaches it (a dense cluster far
 * smaller than the bounding box, e.g. a scan plus one stray vertex a thousand sizes away): then a point is compared
 * with the newest candidates only and may stay unwelded, which is harmless, instead of the search turning quadratic.
 */
const MAX_CANDIDATES = 64;

/** Cell edge in tolerances: large enough that most points need one cell, small enough that cells hold few points. */
const CELL_FACTOR = 16;

export interface WeldResult {
  /** #points: index of the representative (earliest point within tolerance; itself for a representative). */
  representative: Uint32Array;
  /** points merged into an earlier one */
  welded: number;
}

/**
 * @param positions  #points×3 coordinates (any length unit)
 * @param active     optional #points flags; inactive points are neither merged nor merged into (they map to themselves)
 * @param tolerance  merge distance, same unit as positions; 0 merges only identical positions
 */
export function weldVertices(positions: Float64Array, active: Uint8Array | null, tolerance: number): WeldResult {
  const count = positions.length / 3;
  const representative = new Uint32Array(count);
  let minX = Infinity, minY = Infinity, minZ = Infinity;
  let activeCount = 0;
  for (let p = 0; p < count; p++) {
    representative[p] = p;
    if (active !== null && active[p] === 0) continue;
    activeCount++;
    const x = positions[3 * p], y = positions[3 * p + 1], z = positions[3 * p + 2];
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (z < minZ) minZ = z;
  }
  if (activeCount === 0) return { representative, welded: 0 };

  // Zero tolerance still needs a finite cell; any positive size works because only identical points then merge.
  const tol = tolerance > 0 ? tolerance : 0;
  let cell = tol * CELL_FACTOR;
  if (!(cell > 0)) cell = 1;
  const inv = 1 / cell;
  const reach = tol * inv; // tolerance as a fraction of a cell
  const tol2 = tol * tol;

  // Open-addressing table, 4 Int32 per slot: cell x, y, z and the newest representative in the cell (−1 = empty).
  // Starts at ≈ one slot per four points and doubles at half load, so meshes with few distinct vertices (STL
  // corners: about one in six is new) keep a small, cache-friendly table.
  let size = 1 << 10;
  while (size < activeCount / 4) size <<= 1;
  let mask = size - 1;
  let table = new Int32Array(4 * size);
  for (let s = 3; s < table.length; s += 4) table[s] = -1;
  let occupied = 0;
  const next = new Int32Array(count);
  let welded = 0;

  // Exact-copy cache: STL repeats each vertex in ~6 nearby facets. A small direct-mapped table keyed by the
  // coordinates' bits answers those repeats from cache-resident memory. The answer is the same the grid search gives:
  // the representatives within tolerance of a position only gain later (higher) indices, so the earliest one stays.
  const bits = new Uint32Array(positions.buffer, positions.byteOffset, positions.length * 2);
  const cacheX = new Float64Array(EXACT_CACHE_SIZE);
  const cacheY = new Float64Array(EXACT_CACHE_SIZE);
  const cacheZ = new Float64Array(EXACT_CACHE_SIZE);
  const cacheRep = new Int32Array(EXACT_CACHE_SIZE).fill(-1);

  for (let p = 0; p < count; p++) {
    if (active !== null && active[p] === 0) continue;
    const x = positions[3 * p], y = positions[3 * p + 1], z = positions[3 * p + 2];
    const w = 6 * p;
    let hc = Math.imul(bits[w] ^ Math.imul(bits[w + 1], 0x9e3779b1), 0x85ebca77);
    hc = Math.imul(hc ^ bits[w + 2] ^ Math.imul(bits[w + 3], 0xc2b2ae3d), 0x27d4eb2f);
    hc = Math.imul(hc ^ bits[w + 4] ^ Math.imul(bits[w + 5], 0x165667b1), 0x9e3779b1);
    const slot = (hc ^ (hc >>> 15)) & (EXACT_CACHE_SIZE - 1);
    const cached = cacheRep[slot];
    if (cached !== -1 && cacheX[slot] === x && cacheY[slot] === y && cacheZ[slot] === z) {
      if (cached !== p) {
        representative[p] = cached;
        welded++;
      }
      continue;
    }
    const fx = (x - minX) * inv, fy = (y - minY) * inv, fz = (z - minZ) * inv;
    const cx = Math.floor(fx), cy = Math.floor(fy), cz = Math.floor(fz);
    const rx = fx - cx, ry = fy - cy, rz = fz - cz;
    // Neighbour cells to visit on each axis: −1, 0 or +1 beside the own cell.
    const ox = rx < reach ? -1 : rx > 1 - reach ? 1 : 0;
    const oy = ry < reach ? -1 : ry > 1 - reach ? 1 : 0;
    const oz = rz < reach ? -1 : rz > 1 - reach ? 1 : 0;
    let best = -1;
    let own = -1; // slot of the own cell (found or empty)
    let budget = MAX_CANDIDATES;
    for (let a = 0; a <= (ox !== 0 ? 1 : 0); a++) {
      const qx = cx + a * ox;
      for (let b = 0; b <= (oy !== 0 ? 1 : 0); b++) {
        const qy = cy + b * oy;
        for (let c = 0; c <= (oz !== 0 ? 1 : 0); c++) {
          const qz = cz + c * oz;
          let s = hash(qx, qy, qz) & mask;
          while (table[4 * s + 3] !== -1 && (table[4 * s] !== qx || table[4 * s + 1] !== qy || table[4 * s + 2] !== qz)) s = (s + 1) & mask;
          if (a === 0 && b === 0 && c === 0) own = s;
          for (let r = table[4 * s + 3]; r !== -1 && budget > 0; r = next[r]) {
            budget--;
            if (best !== -1 && r > best) continue;
            const dx = positions[3 * r] - x, dy = positions[3 * r + 1] - y, dz = positions[3 * r + 2] - z;
            if (dx * dx + dy * dy + dz * dz <= tol2) best = r;
          }
        }
      }
    }
    cacheX[slot] = x;
    cacheY[slot] = y;
    cacheZ[slot] = z;
    cacheRep[slot] = best !== -1 ? best : p;
    if (best !== -1) {
      representative[p] = best;
      welded++;
      continue;
    }
    if (table[4 * own + 3] === -1) {
      table[4 * own] = cx;
      table[4 * own + 1] = cy;
      table[4 * own + 2] = cz;
      occupied++;
    }
    next[p] = table[4 * own + 3];
    table[4 * own + 3] = p;
    if (occupied * 2 > size) {
      const old = table;
      size <<= 1;
      mask = size - 1;
      table = new Int32Array(4 * size);
      for (let s = 3; s < table.length; s += 4) table[s] = -1;
      for (let o = 0; o < old.length; o += 4) {
        if (old[o + 3] === -1) continue;
        let s = hash(old[o], old[o + 1], old[o + 2]) & mask;
        while (table[4 * s + 3] !== -1) s = (s + 1) & mask;
        table[4 * s] = old[o];
        table[4 * s + 1] = old[o + 1];
        table[4 * s + 2] = old[o + 2];
        table[4 * s + 3] = old[o + 3];
      }
    }
  }
  return { representative, welded };
}

function hash(x: number, y: number, z: number): number {
  let h = Math.imul(x, 0x8da6b343) ^ Math.imul(y, 0xd8163841) ^ Math.imul(z, 0xcb1ab31f);
  h ^= h >>> 15;
  h = Math.imul(h, 0x2c1b3c6d);
  h ^= h >>> 12;
  return h >>> 0;
}
