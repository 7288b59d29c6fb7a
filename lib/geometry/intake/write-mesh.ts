/**
 * Mesh writers for fixtures, benchmarks and exports: Wavefront OBJ text and STL (binary and ASCII).
 * Sources: Wavefront OBJ, Appendix B1 of the Advanced Visualizer manual; 3D Systems, StereoLithography Interface
 * Specification, 1989 (binary: 80-byte header, uint32 facet count, 50 bytes per facet, little-endian).
 */
import type { TriMesh } from "../mesh";

/**
 * OBJ text: one `v` per vertex (shortest round-trip decimal, so reading it back gives the same doubles) and one
 * `f` per triangle (1-based). Vertex order is kept.
 */
export function writeObj(mesh: TriMesh): string {
  const { positions, triangles } = mesh;
  const parts: string[] = ["# Peelform mesh\n"];
  let chunk = "";
  for (let k = 0; k < positions.length; k += 3) {
    chunk += `v ${positions[k]} ${positions[k + 1]} ${positions[k + 2]}\n`;
    if (chunk.length > 1 << 16) { parts.push(chunk); chunk = ""; }
  }
  for (let k = 0; k < triangles.length; k += 3) {
    chunk += `f ${triangles[k] + 1} ${triangles[k + 1] + 1} ${triangles[k + 2] + 1}\n`;
    if (chunk.length > 1 << 16) { parts.push(chunk); chunk = ""; }
  }
  parts.push(chunk);
  return parts.join("");
}

export interface BinaryStlOptions {
  /** header text (ASCII, at most 80 bytes; padded with spaces). Default "Peelform binary STL". */
  header?: string;
}

/** Binary STL: per-face unit normal from the vertex order, float32 coordinates, attribute bytes 0. */
export function writeBinaryStl(mesh: TriMesh, options: BinaryStlOptions = {}): Uint8Array {
  const { positions, triangles } = mesh;
  const faces = triangles.length / 3;
  const out = new Uint8Array(84 + 50 * faces);
  const header = (options.header ?? "Peelform binary STL").slice(0, 80).padEnd(80, " ");
  for (let k = 0; k < 80; k++) out[k] = header.charCodeAt(k) & 0x7f;
  const view = new DataView(out.buffer);
  view.setUint32(80, faces, true);
  let o = 84;
  for (let f = 0; f < faces; f++) {
    const a = 3 * triangles[3 * f], b = 3 * triangles[3 * f + 1], c = 3 * triangles[3 * f + 2];
    const n = faceNormal(positions, a, b, c);
    view.setFloat32(o, n[0], true);
    view.setFloat32(o + 4, n[1], true);
    view.setFloat32(o + 8, n[2], true);
    for (let k = 0; k < 3; k++) {
      view.setFloat32(o + 12 + 4 * k, positions[a + k], true);
      view.setFloat32(o + 24 + 4 * k, positions[b + k], true);
      view.setFloat32(o + 36 + 4 * k, positions[c + k], true);
    }
    o += 50;
  }
  return out;
}

/** ASCII STL text with the given solid name. */
export function writeAsciiStl(mesh: TriMesh, name = "peelform"): string {
  const { positions, triangles } = mesh;
  const parts: string[] = [`solid ${name}\n`];
  for (let f = 0; f < triangles.length / 3; f++) {
    const a = 3 * triangles[3 * f], b = 3 * triangles[3 * f + 1], c = 3 * triangles[3 * f + 2];
    const n = faceNormal(positions, a, b, c);
    parts.push(
      `  facet normal ${n[0]} ${n[1]} ${n[2]}\n    outer loop\n` +
        `      vertex ${positions[a]} ${positions[a + 1]} ${positions[a + 2]}\n` +
        `      vertex ${positions[b]} ${positions[b + 1]} ${positions[b + 2]}\n` +
        `      vertex ${positions[c]} ${positions[c + 1]} ${positions[c + 2]}\n` +
        `    endloop\n  endfacet\n`,
    );
  }
  parts.push(`endsolid ${name}\n`);
  return parts.join("");
}

const normal = [0, 0, 0];

function faceNormal(p: Float64Array, a: number, b: number, c: number): number[] {
  const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
  const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
  const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
  const len = Math.hypot(nx, ny, nz);
  normal[0] = len > 0 ? nx / len : 0;
  normal[1] = len > 0 ? ny / len : 0;
  normal[2] = len > 0 ? nz / len : 0;
  return normal;
}
