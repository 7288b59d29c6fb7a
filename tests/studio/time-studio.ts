/**
 * Timing of the studio logic on a 200k-face mesh (not a test): `npx tsx tests/studio/time-studio.ts`.
 * Prints the build time of the adjacency, seam path queries across the mesh, live piece recomputation and the
 * suggestion and mirror steps. Numbers are for Node on this machine; the browser runs the same V8 code.
 */
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import type { TriMesh } from "@/lib/geometry/mesh";
import { buildStudioMesh } from "@/lib/studio/studio-mesh";
import { createSeamPathFinder } from "@/lib/studio/seam-path";
import { createLivePiecesComputer, explainPiece } from "@/lib/studio/live-pieces";
import { SeamSet } from "@/lib/studio/seam-set";
import { cube } from "@/lib/geometry/shapes/cube";
import { suggestSharpSeams } from "@/lib/studio/sharp-suggestions";
import { createStretchEstimator } from "@/lib/studio/stretch-estimate";
import { suggestDarts } from "@/lib/studio/dart-suggestions";
import { mirrorRuns, mirrorVertices } from "@/lib/studio/mirror-map";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time<T>(fn: () => T): [T, number] {
  const t = performance.now();
  const r = fn();
  return [r, performance.now() - t];
}

function run(name: string, mesh: TriMesh, far: [number, number][]): void {
  const nf = mesh.triangles.length / 3;
  console.log(`\n${name}: ${mesh.positions.length / 3} vertices, ${nf} faces`);
  const [sm, buildMs] = time(() => buildStudioMesh(mesh));
  console.log(`  adjacency (edges, CSR, lengths, dihedrals): ${buildMs.toFixed(1)} ms, ${sm.edgeCount} edges`);
  const finder = createSeamPathFinder(sm);
  const set = new SeamSet(sm);
  let seed = 12345;
  const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
  const random: [number, number][] = Array.from({ length: 20 }, () => [Math.floor(rnd() * sm.vertexCount), Math.floor(rnd() * sm.vertexCount)]);
  for (const [what, pairs] of [["far apart (opposite ends: the worst case)", far], ["random pairs", random]] as const) {
    for (const snap of [false, true]) {
      const ms: number[] = [];
      let settled = 0;
      for (let rep = 0; rep < 3; rep++) {
        for (const [a, b] of pairs) {
          const [path, t] = time(() => finder.find(a, b, { snapToSharp: snap }));
          ms.push(t);
          settled = Math.max(settled, path?.settled ?? 0);
          if (rep === 0 && !snap && pairs === far) set.addRun(path!.vertices);
        }
      }
      console.log(`  seam path, ${what}${snap ? ", snap to sharp" : ""}: median ${median(ms).toFixed(1)} ms, max ${Math.max(...ms).toFixed(1)} ms (${ms.length} queries, up to ${settled} vertices settled)`);
    }
  }
  const computer = createLivePiecesComputer(sm);
  const ms: number[] = [];
  let live = computer.compute(set.onSeam);
  for (let rep = 0; rep < 7; rep++) {
    const [l, t] = time(() => computer.compute(set.onSeam));
    live = l;
    ms.push(t);
  }
  console.log(`  live pieces (${set.seamEdgeCount} seam edges → ${live.count} pieces, disks ${Array.from(live.isDisk).join("")}): median ${median(ms).toFixed(1)} ms, max ${Math.max(...ms).toFixed(1)} ms`);
  const [sharp, sharpMs] = time(() => suggestSharpSeams(sm, { thresholdDeg: 30, onSeam: set.onSeam }));
  const [estimator, estBuildMs] = time(() => createStretchEstimator(sm));
  const estTimes: number[] = [];
  let est = estimator.estimate(live, set.onSeam);
  for (let rep = 0; rep < 5; rep++) {
    const [e, t] = time(() => estimator.estimate(live, set.onSeam));
    est = e;
    estTimes.push(t);
  }
  const estMs = median(estTimes);
  const darts = suggestDarts(sm, est, 0.05);
  console.log(`  suggestions: sharp chains ${sharpMs.toFixed(1)} ms (${sharp.length}); stretch estimate median ${estMs.toFixed(1)} ms, max ${Math.max(...estTimes).toFixed(1)} ms (+ ${estBuildMs.toFixed(1)} ms once per mesh), ${darts.length} dart(s)`);
  const [mirror, mirrorMs] = time(() => mirrorVertices(sm, { axis: "x" }));
  const [mr, mrMs] = time(() => mirrorRuns(sm, mirror, set.runs));
  console.log(`  mirror: partners ${mirrorMs.toFixed(1)} ms (${mirror.unmatched} unmatched), runs ${mrMs.toFixed(1)} ms (${mr.mirrored} edges mirrored, ${mr.failed} not)`);
  const nonDisk = Array.from(live.isDisk).findIndex((d) => d === 0);
  if (nonDisk >= 0) {
    const [, t] = time(() => explainPiece(sm, live, nonDisk));
    console.log(`  explain non-disk piece ${live.labels[nonDisk]} (sentence + suggested cut): ${t.toFixed(1)} ms`);
  }
}

const B = 250, S = 400;
const sphere = uvSphere({ radius: 100, latitudeBands: B, longitudeSegments: S });
const ringV = (k: number, j: number) => 1 + (k - 1) * S + (j % S);
run("UV sphere", sphere, [[0, sphere.positions.length / 3 - 1], [ringV(125, 0), ringV(125, 200)], [ringV(10, 0), ringV(240, 133)]]);
const grid = flatGrid({ faces: 200_000, size: 1000, bump: 60 });
const m = Math.round(Math.sqrt(100_000)) + 1;
run("bumped grid", grid, [[0, m * m - 1], [m - 1, m * (m - 1)], [Math.floor(m / 2), m * m - 1 - Math.floor(m / 2)]]);
const n = 129; // 6·2·129² = 199 692 faces
const box = cube({ size: 100, subdivisions: n });
const corner = (x: number, y: number, z: number): number => {
  for (let v = 0; v < box.positions.length / 3; v++) if (box.positions[3 * v] === x && box.positions[3 * v + 1] === y && box.positions[3 * v + 2] === z) return v;
  throw new Error("no corner");
};
run("subdivided cube (sharp edges)", box, [[corner(-50, -50, -50), corner(50, 50, 50)], [corner(-50, -50, 50), corner(50, 50, 50)], [corner(50, -50, -50), corner(-50, 50, 50)]]);
