"use client";

import { useMutation, useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { JobStatusDto } from "@/lib/jobs/job-status";
import type { FlattenParamsInput } from "@/lib/validations/flatten";

/** POST /api/scans/[id]/flatten → 202 { jobId, patternId }. */
export function useQueueFlatten(scanId: string) {
  return useMutation({
    mutationFn: (params: FlattenParamsInput) =>
      apiFetch<{ jobId: string; patternId: string }>(`/api/scans/${encodeURIComponent(scanId)}/flatten`, { method: "POST", body: params }),
  });
}

/** GET /api/jobs/[id], every second until the job is completed or failed. */
export function useFlattenJob(jobId: string | null) {
  return useQuery({
    queryKey: ["jobs", jobId ?? "none"],
    enabled: jobId !== null,
    queryFn: ({ signal }) => apiFetch<Omit<JobStatusDto, "id">>(`/api/jobs/${encodeURIComponent(jobId ?? "")}`, { signal }),
    refetchInterval: (q) => (q.state.data && (q.state.data.state === "completed" || q.state.data.state === "failed") ? false : 1_000),
  });
}
