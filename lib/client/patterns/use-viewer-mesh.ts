"use client";

import { useQuery } from "@tanstack/react-query";
import { decodeViewerMesh } from "@/lib/scans/mesh-binary";
import { fetchBinary } from "./fetch-binary";
import { patternKeys } from "./pattern-keys";

/** A ready scan's working mesh (GET /api/scans/[id]/mesh), decoded. */
export function useViewerMesh(scanId: string, meshUrl: string | null) {
  return useQuery({
    queryKey: patternKeys.viewerMesh(scanId),
    queryFn: async ({ signal }) => decodeViewerMesh(await fetchBinary(meshUrl!, signal)),
    enabled: meshUrl !== null,
    staleTime: Infinity,
  });
}
