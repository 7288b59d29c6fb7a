"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas } from "@react-three/fiber";
import { useEffect, useMemo } from "react";
import { BufferAttribute, BufferGeometry } from "three";
import type { TriMesh } from "@/lib/geometry/mesh";
import type { FaceStretch } from "@/lib/client/patterns/face-stretch";
import { stretchColourInto } from "@/lib/client/patterns/stretch-scale";

/** Grey of faces no flattened piece covers, and the share of grey mixed into pieces that are not picked. */
const UNCOVERED = [0.62, 0.6, 0.56] as const;
const DIM_MIX = 0.75;

/**
 * Non-indexed geometry (3 vertices per face) so every face has its own colour, centred on the origin.
 * @returns the geometry and the largest distance of a vertex from the box centre (scan units)
 */
function buildGeometry(mesh: TriMesh): { geometry: BufferGeometry; radius: number } {
  const { positions: p, triangles: t } = mesh;
  const f = t.length / 3;
  let minX = Infinity, minY = Infinity, minZ = Infinity, maxX = -Infinity, maxY = -Infinity, maxZ = -Infinity;
  for (let i = 0; i < t.length; i++) {
    const v = 3 * t[i];
    if (p[v] < minX) minX = p[v];
    if (p[v] > maxX) maxX = p[v];
    if (p[v + 1] < minY) minY = p[v + 1];
    if (p[v + 1] > maxY) maxY = p[v + 1];
    if (p[v + 2] < minZ) minZ = p[v + 2];
    if (p[v + 2] > maxZ) maxZ = p[v + 2];
  }
  const cx = (minX + maxX) / 2, cy = (minY + maxY) / 2, cz = (minZ + maxZ) / 2;
  const out = new Float32Array(9 * f);
  let r2 = 0;
  for (let i = 0; i < t.length; i++) {
    const v = 3 * t[i];
    const x = p[v] - cx, y = p[v + 1] - cy, z = p[v + 2] - cz;
    out[3 * i] = x;
    out[3 * i + 1] = y;
    out[3 * i + 2] = z;
    if (x * x + y * y + z * z > r2) r2 = x * x + y * y + z * z;
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(out, 3));
  geometry.setAttribute("color", new BufferAttribute(new Float32Array(9 * f), 3));
  geometry.computeVertexNormals();
  const radius = Math.max(1e-9, Math.sqrt(r2));
  return { geometry, radius };
}

/** Writes every face's colour: its stretch, greyed when another piece is picked. */
function paint(geometry: BufferGeometry, faces: FaceStretch, limit: number, selected: number): void {
  const attr = geometry.getAttribute("color") as BufferAttribute;
  const c = attr.array as Float32Array;
  const rgb = new Float32Array(3);
  const n = faces.piece.length;
  for (let f = 0; f < n; f++) {
    const k = faces.piece[f];
    if (k < 0) {
      rgb[0] = UNCOVERED[0]; rgb[1] = UNCOVERED[1]; rgb[2] = UNCOVERED[2];
    } else {
      stretchColourInto(faces.stretch[f], limit, rgb, 0);
      if (selected >= 0 && k !== selected) {
        rgb[0] += (UNCOVERED[0] - rgb[0]) * DIM_MIX;
        rgb[1] += (UNCOVERED[1] - rgb[1]) * DIM_MIX;
        rgb[2] += (UNCOVERED[2] - rgb[2]) * DIM_MIX;
      }
    }
    for (let j = 0; j < 3; j++) {
      c[9 * f + 3 * j] = rgb[0];
      c[9 * f + 3 * j + 1] = rgb[1];
      c[9 * f + 3 * j + 2] = rgb[2];
    }
  }
  attr.needsUpdate = true;
}

/**
 * The scan coloured by the stretch of the flat piece each face went to (the same colours as the flat sheet), with
 * orbit controls and a key/fill light pair. `selected` is the picked piece's index in report order, −1 none.
 * The drawing buffer is kept so the view can be copied (and checked) after it is drawn.
 */
export function ScanHeatCanvas({ mesh, faces, limit, selected }: { mesh: TriMesh; faces: FaceStretch; limit: number; selected: number }) {
  const { geometry, radius } = useMemo(() => buildGeometry(mesh), [mesh]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  useEffect(() => paint(geometry, faces, limit, selected), [geometry, faces, limit, selected]);

  return (
    // About 3.2 radii out: the bounding sphere fits the 40° view with a margin from the starting angle.
    <Canvas
      data-testid="scan-heat-canvas"
      gl={{ preserveDrawingBuffer: true, antialias: true }}
      camera={{ position: [radius * 1.78, radius * 1.19, radius * 2.38], near: radius / 100, far: radius * 100, fov: 40 }}
      className="bg-kraft-100"
      aria-label="Scan coloured by stretch"
    >
      <ambientLight intensity={0.55} />
      <directionalLight position={[radius * 2, radius * 3, radius * 2]} intensity={1.6} />
      <directionalLight position={[-radius * 2, -radius, -radius * 1.5]} intensity={0.5} />
      <mesh geometry={geometry}>
        <meshStandardMaterial vertexColors roughness={0.85} metalness={0} side={2} />
      </mesh>
      <OrbitControls makeDefault enableDamping={false} />
    </Canvas>
  );
}
