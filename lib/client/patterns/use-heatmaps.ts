"use client";

import { useQueries } from "@tanstack/react-query";
import { decodeHeatmap, type HeatmapArrays } from "@/lib/scans/mesh-binary";
import { fetchBinary } from "./fetch-binary";
import { patternKeys } from "./pattern-keys";

export interface PieceHeatmaps {
  /** label → decoded heat map; pieces still loading or without a map are absent */
  byLabel: ReadonlyMap<string, HeatmapArrays>;
  loading: boolean;
  error: unknown;
}

/** The stretch heat maps of the given pieces (GET /api/patterns/[id]/pieces/[label]/heatmap), fetched in parallel. */
export function useHeatmaps(patternId: string, labels: readonly string[]): PieceHeatmaps {
  return useQueries({
    queries: labels.map((label) => ({
      queryKey: patternKeys.heatmap(patternId, label),
      queryFn: async ({ signal }: { signal: AbortSignal }) =>
        decodeHeatmap(await fetchBinary(`/api/patterns/${encodeURIComponent(patternId)}/pieces/${encodeURIComponent(label)}/heatmap`, signal)),
      staleTime: Infinity,
    })),
    combine: (results) => {
      const byLabel = new Map<string, HeatmapArrays>();
      results.forEach((r, i) => {
        if (r.data) byLabel.set(labels[i], r.data);
      });
      return { byLabel, loading: results.some((r) => r.isPending), error: results.find((r) => r.error)?.error ?? null };
    },
  });
}
