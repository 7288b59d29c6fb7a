"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "./api-fetch";
import type { MeResponse } from "./api-types";
import { queryKeys } from "./query-keys";

/** The signed-in user, active shop, role and permissions (GET /api/me). */
export function useMe(initial?: MeResponse) {
  return useQuery({
    queryKey: queryKeys.me,
    queryFn: ({ signal }) => apiFetch<MeResponse>("/api/me", { signal }),
    initialData: initial,
    enabled: initial !== undefined,
  });
}

/** Switch the active shop (POST /api/me/shop); every cached query belongs to the old shop, so all are dropped. */
export function useSwitchShop() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (shopId: string) => apiFetch<unknown>("/api/me/shop", { method: "POST", body: { shopId } }),
    onSuccess: () => client.invalidateQueries(),
  });
}
