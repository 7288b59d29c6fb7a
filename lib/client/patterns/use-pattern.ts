"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { PatternDto } from "@/lib/patterns-store/pattern-dto";
import { patternKeys } from "./pattern-keys";

/** GET /api/patterns/[id]; polls every 1.5 s while the pattern is still queued or being made. */
export function usePattern(id: string, initial?: PatternDto) {
  return useQuery({
    queryKey: patternKeys.pattern(id),
    queryFn: ({ signal }) => apiFetch<PatternDto>(`/api/patterns/${encodeURIComponent(id)}`, { signal }),
    initialData: initial,
    refetchInterval: (q) => (q.state.data && (q.state.data.status === "queued" || q.state.data.status === "processing") ? 1_500 : false),
  });
}
