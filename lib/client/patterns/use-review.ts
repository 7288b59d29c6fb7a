"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api-fetch";
import type { PatternDto } from "@/lib/patterns-store/pattern-dto";
import type { ReviewDecision } from "@/lib/reviews/review-decisions";
import { patternKeys } from "./pattern-keys";

/** POST /api/patterns/[id]/reviews; the answer (the pattern with its history) replaces the cached pattern. */
export function useReviewDecision(patternId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { decision: ReviewDecision; comment?: string }) =>
      apiFetch<PatternDto>(`/api/patterns/${encodeURIComponent(patternId)}/reviews`, { method: "POST", body }),
    onSuccess: (pattern) => client.setQueryData(patternKeys.pattern(patternId), pattern),
  });
}
