"use client";

import { useMutation } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { SeamMapDto } from "@/lib/seam-maps/seam-maps";

/** PUT /api/scans/[id]/seams: saves `{ seams }` as a new version and answers it with the server's pieces. */
export function useSaveSeams(scanId: string) {
  return useMutation({
    mutationFn: (seams: [number, number][]) =>
      apiFetch<SeamMapDto>(`/api/scans/${encodeURIComponent(scanId)}/seams`, { method: "PUT", body: { seams } }),
  });
}
