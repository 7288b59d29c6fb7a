/**
 * Compact binary files of a scan's meshes, little-endian, every array aligned to its element size.
 *
 * Viewer mesh (GET /api/scans/[id]/mesh, `application/octet-stream`):
 *   bytes 0-7   magic "PFMESH1\0"
 *   8-11        uint32 V (vertex count, the full working index space: seam indices refer to it)
 *   12-15       uint32 F (face count)
 *   16 …        Float32 positions, V×3, scan units
 *   then        Uint32 triangles, F×3
 * Intake copy (worker and seam checks; lossless, so a flatten sees exactly the mesh the intake made):
 *   0-7 "PFINTK1\0", 8 V, 12 F, 16 N (input-file vertex count), 20 reserved 0,
 *   24 … Float64 positions V×3, Uint32 triangles F×3, Uint32 inputToWorking N
 * Piece heat map (per flattened piece of a pattern):
 *   0-7 "PFHEAT1\0", 8 V, 12 F, 16 … Float32 uv V×2 (laid out, pattern units), Uint32 triangles F×3,
 *   Float32 s1 F, Float32 s2 F, Uint32 working face ids F
 */
import type { TriMesh } from "@/lib/geometry/mesh";

const VIEWER_MAGIC = "PFMESH1\0";
const INTAKE_MAGIC = "PFINTK1\0";
const HEAT_MAGIC = "PFHEAT1\0";

function writeMagic(view: DataView, magic: string): void {
  for (let i = 0; i < 8; i++) view.setUint8(i, magic.charCodeAt(i));
}

function checkMagic(bytes: Uint8Array, magic: string, what: string): DataView {
  if (bytes.byteLength < 16) throw new Error(`${what}: file too short (${bytes.byteLength} bytes)`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = 0; i < 8; i++) {
    if (view.getUint8(i) !== magic.charCodeAt(i)) throw new Error(`${what}: not a ${magic.slice(0, 7)} file`);
  }
  return view;
}

/** A copy of the bytes at an offset that is a multiple of the element size (Buffers from S3 may be unaligned). */
function aligned(bytes: Uint8Array): Uint8Array {
  return bytes.byteOffset % 8 === 0 ? bytes : new Uint8Array(bytes);
}

export function encodeViewerMesh(mesh: TriMesh): Buffer {
  const v = mesh.positions.length / 3, f = mesh.triangles.length / 3;
  const out = new ArrayBuffer(16 + 12 * v + 12 * f);
  const view = new DataView(out);
  writeMagic(view, VIEWER_MAGIC);
  view.setUint32(8, v, true);
  view.setUint32(12, f, true);
  new Float32Array(out, 16, 3 * v).set(mesh.positions);
  new Uint32Array(out, 16 + 12 * v, 3 * f).set(mesh.triangles);
  return Buffer.from(out);
}

/** Reads a viewer mesh (positions widened to Float64). */
export function decodeViewerMesh(input: Uint8Array): TriMesh {
  const bytes = aligned(input);
  const view = checkMagic(bytes, VIEWER_MAGIC, "viewer mesh");
  const v = view.getUint32(8, true), f = view.getUint32(12, true);
  if (bytes.byteLength !== 16 + 12 * v + 12 * f) throw new Error(`viewer mesh: ${bytes.byteLength} bytes for ${v} vertices and ${f} faces`);
  return {
    positions: Float64Array.from(new Float32Array(bytes.buffer, bytes.byteOffset + 16, 3 * v)),
    triangles: new Uint32Array(bytes.buffer.slice(bytes.byteOffset + 16 + 12 * v, bytes.byteOffset + 16 + 12 * v + 12 * f)),
  };
}

export interface IntakeArrays {
  mesh: TriMesh;
  inputToWorking: Uint32Array;
}

export function encodeIntake(intake: IntakeArrays): Buffer {
  const v = intake.mesh.positions.length / 3, f = intake.mesh.triangles.length / 3, n = intake.inputToWorking.length;
  const out = new ArrayBuffer(24 + 24 * v + 12 * f + 4 * n);
  const view = new DataView(out);
  writeMagic(view, INTAKE_MAGIC);
  view.setUint32(8, v, true);
  view.setUint32(12, f, true);
  view.setUint32(16, n, true);
  new Float64Array(out, 24, 3 * v).set(intake.mesh.positions);
  new Uint32Array(out, 24 + 24 * v, 3 * f).set(intake.mesh.triangles);
  new Uint32Array(out, 24 + 24 * v + 12 * f, n).set(intake.inputToWorking);
  return Buffer.from(out);
}

export function decodeIntake(input: Uint8Array): IntakeArrays {
  const bytes = aligned(input);
  const view = checkMagic(bytes, INTAKE_MAGIC, "intake copy");
  const v = view.getUint32(8, true), f = view.getUint32(12, true), n = view.getUint32(16, true);
  if (bytes.byteLength !== 24 + 24 * v + 12 * f + 4 * n) throw new Error(`intake copy: ${bytes.byteLength} bytes do not match its counts`);
  const o = bytes.byteOffset;
  return {
    mesh: {
      positions: new Float64Array(bytes.buffer.slice(o + 24, o + 24 + 24 * v)),
      triangles: new Uint32Array(bytes.buffer.slice(o + 24 + 24 * v, o + 24 + 24 * v + 12 * f)),
    },
    inputToWorking: new Uint32Array(bytes.buffer.slice(o + 24 + 24 * v + 12 * f, o + 24 + 24 * v + 12 * f + 4 * n)),
  };
}

export interface HeatmapArrays {
  uv: Float64Array;
  triangles: Uint32Array;
  s1: Float64Array;
  s2: Float64Array;
  faces: Uint32Array;
}

export function encodeHeatmap(h: HeatmapArrays): Buffer {
  const v = h.uv.length / 2, f = h.triangles.length / 3;
  const out = new ArrayBuffer(16 + 8 * v + 12 * f + 12 * f);
  const view = new DataView(out);
  writeMagic(view, HEAT_MAGIC);
  view.setUint32(8, v, true);
  view.setUint32(12, f, true);
  let o = 16;
  new Float32Array(out, o, 2 * v).set(h.uv);
  o += 8 * v;
  new Uint32Array(out, o, 3 * f).set(h.triangles);
  o += 12 * f;
  new Float32Array(out, o, f).set(h.s1);
  o += 4 * f;
  new Float32Array(out, o, f).set(h.s2);
  o += 4 * f;
  new Uint32Array(out, o, f).set(h.faces);
  return Buffer.from(out);
}

export function decodeHeatmap(input: Uint8Array): HeatmapArrays {
  const bytes = aligned(input);
  const view = checkMagic(bytes, HEAT_MAGIC, "heat map");
  const v = view.getUint32(8, true), f = view.getUint32(12, true);
  if (bytes.byteLength !== 16 + 8 * v + 24 * f) throw new Error(`heat map: ${bytes.byteLength} bytes do not match its counts`);
  const b = bytes.buffer, o = bytes.byteOffset + 16;
  return {
    uv: Float64Array.from(new Float32Array(b, o, 2 * v)),
    triangles: new Uint32Array(b.slice(o + 8 * v, o + 8 * v + 12 * f)),
    s1: Float64Array.from(new Float32Array(b, o + 8 * v + 12 * f, f)),
    s2: Float64Array.from(new Float32Array(b, o + 8 * v + 16 * f, f)),
    faces: new Uint32Array(b.slice(o + 8 * v + 20 * f, o + 8 * v + 24 * f)),
  };
}
