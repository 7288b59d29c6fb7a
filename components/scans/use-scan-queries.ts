"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { ScanDto } from "@/lib/scans/scans";
import type { JobStatusDto } from "@/lib/jobs/job-status";
import type { PatternSummaryDto } from "@/lib/patterns-store/pattern-dto";
import type { FlattenParamsInput } from "@/lib/validations/flatten";

/** TanStack Query hooks of the project page's scans, flatten jobs and patterns. */
export const scanKeys = {
  scans: (projectId: string) => ["projects", projectId, "scans"] as const,
  patterns: (projectId: string) => ["projects", projectId, "patterns"] as const,
  job: (jobId: string) => ["jobs", jobId] as const,
};

/** Scans of a project; polls every 2 s while one is still processing. */
export function useScans(projectId: string) {
  return useQuery({
    queryKey: scanKeys.scans(projectId),
    queryFn: async ({ signal }) => (await apiFetch<{ scans: ScanDto[] }>(`/api/projects/${encodeURIComponent(projectId)}/scans`, { signal })).scans,
    refetchInterval: (q) => (q.state.data?.some((s) => s.status === "processing") ? 2_000 : false),
  });
}

export function usePatterns(projectId: string) {
  return useQuery({
    queryKey: scanKeys.patterns(projectId),
    queryFn: async ({ signal }) => (await apiFetch<{ patterns: PatternSummaryDto[] }>(`/api/projects/${encodeURIComponent(projectId)}/patterns`, { signal })).patterns,
    refetchInterval: (q) => (q.state.data?.some((p) => p.status === "queued" || p.status === "processing") ? 3_000 : false),
  });
}

export function useFlatten(projectId: string, scanId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (params: FlattenParamsInput) =>
      apiFetch<{ jobId: string; patternId: string }>(`/api/scans/${encodeURIComponent(scanId)}/flatten`, { method: "POST", body: params }),
    onSuccess: () => client.invalidateQueries({ queryKey: scanKeys.patterns(projectId) }),
  });
}

/** A flatten job's state; polls every second until it is completed or failed. */
export function useJob(jobId: string) {
  return useQuery({
    queryKey: scanKeys.job(jobId),
    queryFn: ({ signal }) => apiFetch<Omit<JobStatusDto, "id">>(`/api/jobs/${encodeURIComponent(jobId)}`, { signal }),
    refetchInterval: (q) => (q.state.data && (q.state.data.state === "completed" || q.state.data.state === "failed") ? false : 1_000),
  });
}
