"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame, useThree } from "@react-three/fiber";
import { useEffect, useMemo, useRef, type RefObject } from "react";
import * as THREE from "three";
import { acceleratedRaycast, MeshBVH } from "three-mesh-bvh";
import { FatSegments } from "./fat-segments";
import { BARE_COLOR, pieceColor } from "./piece-palette";
import type { PieceTag, ScanViewerProps, SurfacePick } from "./viewer-types";

// BVH-accelerated raycasts for every mesh that carries a boundsTree (three-mesh-bvh), so any raycast on a
// 200k-face scan stays well under a frame
(THREE.Mesh.prototype as unknown as { raycast: unknown }).raycast = acceleratedRaycast;

interface Built { geometry: THREE.BufferGeometry; bvh: MeshBVH }

interface Frame { center: THREE.Vector3; radius: number; box: THREE.Box3 }

/**
 * Display geometry: one corner per face side (non-indexed) so each face can take its piece's colour crisply;
 * smooth normals come from the indexed mesh before it is expanded.
 */
function buildGeometry(positions: Float64Array, triangles: Uint32Array): Built {
  const indexed = new THREE.BufferGeometry();
  indexed.setAttribute("position", new THREE.BufferAttribute(Float32Array.from(positions), 3));
  indexed.setIndex(new THREE.BufferAttribute(triangles, 1));
  indexed.computeVertexNormals();
  const g = indexed.toNonIndexed();
  indexed.dispose();
  g.setAttribute("color", new THREE.BufferAttribute(new Float32Array(triangles.length * 3), 3));
  g.computeBoundingBox();
  g.computeBoundingSphere();
  const bvh = new MeshBVH(g);
  (g as unknown as { boundsTree: MeshBVH }).boundsTree = bvh;
  return { geometry: g, bvh };
}

function paint(g: THREE.BufferGeometry, facePiece: Int32Array | null): void {
  const attr = g.getAttribute("color") as THREE.BufferAttribute;
  const arr = attr.array as Float32Array;
  const nf = arr.length / 9;
  const bare = new THREE.Color(BARE_COLOR);
  const cache = new Map<number, THREE.Color>();
  for (let f = 0; f < nf; f++) {
    const p = facePiece ? facePiece[f] : -1;
    let c = bare;
    if (p >= 0) {
      c = cache.get(p) ?? new THREE.Color(pieceColor(p));
      cache.set(p, c);
    }
    for (let k = 0; k < 3; k++) { arr[9 * f + 3 * k] = c.r; arr[9 * f + 3 * k + 1] = c.g; arr[9 * f + 3 * k + 2] = c.b; }
  }
  attr.needsUpdate = true;
}

/** Clicks (not drags) on the canvas → BVH raycast → nearest corner of the hit face. Touch taps count as clicks. */
function Picker({ geometry, bvh, triangles, enabled, onPick }: { geometry: THREE.BufferGeometry; bvh: MeshBVH; triangles: Uint32Array; enabled: boolean; onPick: (p: SurfacePick) => void }) {
  const { camera, gl } = useThree();
  const latest = useRef(onPick);
  latest.current = onPick;
  useEffect(() => {
    if (!enabled) return;
    const el = gl.domElement;
    const raycaster = new THREE.Raycaster();
    const ndc = new THREE.Vector2();
    let down: { x: number; y: number; id: number } | null = null;
    const onDown = (e: PointerEvent) => { down = { x: e.clientX, y: e.clientY, id: e.pointerId }; };
    const onUp = (e: PointerEvent) => {
      if (!down || down.id !== e.pointerId || e.button > 0) return;
      const moved = Math.hypot(e.clientX - down.x, e.clientY - down.y);
      down = null;
      if (moved > 6) return;
      const rect = el.getBoundingClientRect();
      ndc.set(((e.clientX - rect.left) / rect.width) * 2 - 1, -((e.clientY - rect.top) / rect.height) * 2 + 1);
      raycaster.setFromCamera(ndc, camera);
      const t0 = performance.now();
      const hit = bvh.raycastFirst(raycaster.ray, THREE.DoubleSide);
      const ms = performance.now() - t0;
      if (!hit || !hit.face) {
        console.debug(`[peelform viewer] pick: miss in ${ms.toFixed(3)} ms`);
        return;
      }
      const face = Math.floor(hit.face.a / 3);
      const pos = geometry.getAttribute("position") as THREE.BufferAttribute;
      let best = 0, bestD = Infinity;
      for (let k = 0; k < 3; k++) {
        const d = hit.point.distanceToSquared(new THREE.Vector3().fromBufferAttribute(pos, 3 * face + k));
        if (d < bestD) { bestD = d; best = k; }
      }
      console.debug(`[peelform viewer] pick: face ${face} in ${ms.toFixed(3)} ms`);
      latest.current({ vertex: triangles[3 * face + best], face, point: [hit.point.x, hit.point.y, hit.point.z], ms });
    };
    el.addEventListener("pointerdown", onDown);
    el.addEventListener("pointerup", onUp);
    return () => { el.removeEventListener("pointerdown", onDown); el.removeEventListener("pointerup", onUp); };
  }, [camera, gl, geometry, bvh, triangles, enabled]);
  return null;
}

/** Puts the camera on a three-quarter view that holds the whole scan, whenever `fitKey` changes. */
function Fitter({ frame, fitKey }: { frame: Frame; fitKey: number }) {
  const { camera, controls } = useThree();
  useEffect(() => {
    const cam = camera as THREE.PerspectiveCamera;
    const dist = frame.radius / Math.sin(THREE.MathUtils.degToRad(cam.fov / 2)) * 1.1;
    const dir = new THREE.Vector3(0.55, 0.35, 1).normalize();
    cam.position.copy(frame.center).addScaledVector(dir, dist);
    cam.near = Math.max(dist / 1000, frame.radius / 1e4);
    cam.far = dist * 10;
    cam.updateProjectionMatrix();
    const c = controls as unknown as { target: THREE.Vector3; update: () => void } | null;
    if (c) { c.target.copy(frame.center); c.update(); } else cam.lookAt(frame.center);
  }, [camera, controls, frame, fitKey]);
  return null;
}

/**
 * Moves the piece letters (plain DOM spans over the canvas) to their anchors every frame, and hides a letter whose
 * anchor is behind the surface (a BVH ray from the camera hits something clearly nearer).
 */
function TagProjector({ tags, bvh, layer, radius }: { tags: PieceTag[]; bvh: MeshBVH; layer: RefObject<HTMLDivElement | null>; radius: number }) {
  const { camera, size } = useThree();
  const v = useMemo(() => new THREE.Vector3(), []);
  const ray = useMemo(() => new THREE.Ray(), []);
  useFrame(() => {
    const root = layer.current;
    if (!root) return;
    const spans = root.children;
    for (let i = 0; i < tags.length && i < spans.length; i++) {
      const el = spans[i] as HTMLElement;
      const [x, y, z] = tags[i].position;
      v.set(x, y, z);
      ray.origin.copy(camera.position);
      ray.direction.copy(v).sub(camera.position);
      const dist = ray.direction.length();
      ray.direction.normalize();
      const hit = bvh.raycastFirst(ray, THREE.DoubleSide);
      const hidden = hit !== null && hit.distance < dist - radius * 0.02;
      v.project(camera);
      if (hidden || v.z > 1) { el.style.visibility = "hidden"; continue; }
      el.style.visibility = "visible";
      el.style.transform = `translate(-50%, -50%) translate(${((v.x + 1) / 2) * size.width}px, ${((1 - v.y) / 2) * size.height}px)`;
    }
  });
  return null;
}

/** Asks for a frame after every render of the viewer (the canvas draws on demand, not 60 times a second). */
function Invalidator() {
  const invalidate = useThree((st) => st.invalidate);
  useEffect(() => { invalidate(); });
  return null;
}

function MirrorPlane({ mirror, frame }: { mirror: NonNullable<ScanViewerProps["mirror"]>; frame: Frame }) {
  const size = new THREE.Vector3();
  frame.box.getSize(size);
  const s = Math.max(size.x, size.y, size.z) * 1.15;
  const pos: [number, number, number] = [frame.center.x, frame.center.y, frame.center.z];
  const rot: [number, number, number] = mirror.axis === "x" ? [0, Math.PI / 2, 0] : mirror.axis === "y" ? [Math.PI / 2, 0, 0] : [0, 0, 0];
  pos[mirror.axis === "x" ? 0 : mirror.axis === "y" ? 1 : 2] = mirror.offset;
  return (
    <mesh position={pos} rotation={rot} renderOrder={5}>
      <planeGeometry args={[s, s]} />
      <meshBasicMaterial color="#2f7f86" transparent opacity={0.16} side={THREE.DoubleSide} depthWrite={false} />
    </mesh>
  );
}

/** The scan in 3D with its pieces, seams, tags and tools' markers. Client only (WebGL). */
export function ScanViewer(props: ScanViewerProps) {
  const { mesh, facePiece, lines, tags, markers, mirror, wireframe, fitKey, picking, onPick } = props;
  const { geometry, bvh } = useMemo(() => buildGeometry(mesh.positions, mesh.triangles), [mesh]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  useEffect(() => paint(geometry, facePiece), [geometry, facePiece]);
  const frame = useMemo<Frame>(() => {
    const box = geometry.boundingBox!.clone();
    const center = box.getCenter(new THREE.Vector3());
    return { box, center, radius: Math.max(geometry.boundingSphere!.radius, 1e-9) };
  }, [geometry]);
  const markerRadius = frame.radius * 0.012;
  const tagLayer = useRef<HTMLDivElement>(null);

  return (
    <div className="relative h-full w-full">
    <Canvas
      camera={{ fov: 40, position: [0, 0, 10] }}
      gl={{ antialias: true, preserveDrawingBuffer: true }}
      dpr={[1, 2]}
      frameloop="demand"
      style={{ touchAction: "none" }}
    >
      <color attach="background" args={["#f3ede2"]} />
      <hemisphereLight args={["#fffaf0", "#6b5a44", 0.9]} />
      <directionalLight position={[frame.center.x + frame.radius * 2, frame.center.y + frame.radius * 3, frame.center.z + frame.radius * 2]} intensity={1.6} />
      <directionalLight position={[frame.center.x - frame.radius * 2, frame.center.y - frame.radius, frame.center.z - frame.radius * 2]} intensity={0.55} color="#cfe3ff" />
      <mesh geometry={geometry}>
        <meshStandardMaterial vertexColors roughness={0.8} metalness={0} side={THREE.DoubleSide} polygonOffset polygonOffsetFactor={1} polygonOffsetUnits={1} />
      </mesh>
      {wireframe ? (
        <mesh geometry={geometry} renderOrder={1}>
          <meshBasicMaterial wireframe color="#5a4a36" transparent opacity={0.35} />
        </mesh>
      ) : null}
      {lines.map((l) => (
        <FatSegments key={l.id} positions={l.positions} color={l.color} width={l.width} dashed={l.dashed} onTop={l.onTop} />
      ))}
      {markers.map((m, i) => (
        <mesh key={i} position={m.position} renderOrder={11}>
          <sphereGeometry args={[markerRadius, 12, 8]} />
          <meshBasicMaterial color={m.color} depthTest={false} transparent />
        </mesh>
      ))}
      <TagProjector tags={tags} bvh={bvh} layer={tagLayer} radius={frame.radius} />
      {mirror ? <MirrorPlane mirror={mirror} frame={frame} /> : null}
      <OrbitControls makeDefault enableDamping={false} />
      <Fitter frame={frame} fitKey={fitKey} />
      <Invalidator />
      <Picker geometry={geometry} bvh={bvh} triangles={mesh.triangles} enabled={picking} onPick={onPick} />
    </Canvas>
      <div ref={tagLayer} className="pointer-events-none absolute inset-0 overflow-hidden" aria-hidden="true">
        {tags.map((t) => (
          <span
            key={t.key}
            style={{ visibility: "hidden" }}
            className={`absolute left-0 top-0 select-none whitespace-nowrap border px-1 text-xs font-bold ${t.flagged ? "border-ember-700 bg-ember-700 text-white" : "border-kraft-700 bg-white/90 text-kraft-900"}`}
          >
            {t.text}
          </span>
        ))}
      </div>
    </div>
  );
}
