"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { ScanDto } from "@/lib/scans/scans";
import { patternKeys } from "./pattern-keys";

/** GET /api/scans/[id]; polls every 1.5 s while the intake is still reading the mesh. */
export function useScanStatus(scanId: string | null, initial?: ScanDto) {
  return useQuery({
    queryKey: patternKeys.scan(scanId ?? "none"),
    queryFn: ({ signal }) => apiFetch<ScanDto>(`/api/scans/${encodeURIComponent(scanId!)}`, { signal }),
    enabled: scanId !== null,
    initialData: initial,
    refetchInterval: (q) => (q.state.data?.status === "processing" ? 1_500 : false),
  });
}
