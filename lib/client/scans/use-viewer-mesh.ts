"use client";

import { useQuery } from "@tanstack/react-query";
import { ApiError } from "@/lib/client/api-fetch";
import type { TriMesh } from "@/lib/geometry/mesh";
import { decodeViewerMesh } from "@/lib/scans/mesh-binary";

export const viewerMeshKey = (scanId: string) => ["scans", scanId, "mesh"] as const;

/**
 * The scan's working mesh from GET /api/scans/[id]/mesh (the compact binary of lib/scans/mesh-binary.ts), decoded to
 * a TriMesh in scan units. Vertex ids are the working ids the seam API takes.
 */
export function useViewerMesh(scanId: string) {
  return useQuery({
    queryKey: viewerMeshKey(scanId),
    staleTime: Infinity,
    queryFn: async ({ signal }): Promise<TriMesh> => {
      let res: Response;
      try {
        res = await fetch(`/api/scans/${encodeURIComponent(scanId)}/mesh`, { credentials: "same-origin", signal });
      } catch (err) {
        if (err instanceof DOMException && err.name === "AbortError") throw err;
        throw new ApiError(0, "NETWORK", "Could not reach the server to load the scan.");
      }
      if (!res.ok) {
        const body = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
        throw new ApiError(res.status, body?.error?.code ?? `HTTP_${res.status}`, body?.error?.message ?? `The server answered ${res.status}.`);
      }
      return decodeViewerMesh(new Uint8Array(await res.arrayBuffer()));
    },
  });
}
