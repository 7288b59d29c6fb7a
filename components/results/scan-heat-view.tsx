"use client";

import dynamic from "next/dynamic";
import { useMemo } from "react";
import { errorMessage } from "@/lib/client/api-fetch";
import { faceStretch } from "@/lib/client/patterns/face-stretch";
import { useViewerMesh } from "@/lib/client/patterns/use-viewer-mesh";
import type { HeatmapArrays } from "@/lib/scans/mesh-binary";

const ScanHeatCanvas = dynamic(() => import("./scan-heat-canvas").then((m) => m.ScanHeatCanvas), {
  ssr: false,
  loading: () => <ViewerNote text="Starting the 3D view…" />,
});

function ViewerNote({ text, alert = false }: { text: string; alert?: boolean }) {
  return (
    <div className="flex h-full items-center justify-center p-4 text-center text-sm text-kraft-700" role={alert ? "alert" : undefined}>
      {text}
    </div>
  );
}

/** The scan in 3D with the stretch heat map: loads the viewer mesh, spreads the piece maps over its faces. */
export function ScanHeatView({ scanId, meshUrl, labels, maps, limit, selected }: {
  scanId: string;
  meshUrl: string | null;
  labels: readonly string[];
  maps: ReadonlyMap<string, HeatmapArrays>;
  limit: number;
  selected: string | null;
}) {
  const mesh = useViewerMesh(scanId, meshUrl);
  const faces = useMemo(() => (mesh.data ? faceStretch(mesh.data.triangles.length / 3, labels, maps) : null), [mesh.data, labels, maps]);
  const selectedIndex = selected === null ? -1 : labels.indexOf(selected);

  return (
    <div className="relative aspect-[4/3] w-full border border-kraft-200 bg-kraft-100">
      {meshUrl === null ? <ViewerNote text="The scan's mesh is not available." /> : null}
      {mesh.isError ? <ViewerNote alert text={`Could not load the scan: ${errorMessage(mesh.error)}`} /> : null}
      {mesh.isPending && meshUrl !== null ? <ViewerNote text="Loading the scan…" /> : null}
      {mesh.data && faces ? <ScanHeatCanvas mesh={mesh.data} faces={faces} limit={limit} selected={selectedIndex} /> : null}
      <p className="pointer-events-none absolute bottom-1 left-2 text-[11px] text-kraft-700">Drag to turn · scroll to zoom · right-drag to pan</p>
    </div>
  );
}
