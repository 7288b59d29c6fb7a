"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "./api-fetch";
import type { Invitation, Member, MembersResponse, ShopRole } from "./api-types";
import { queryKeys } from "./query-keys";

export function useMembers() {
  return useQuery({
    queryKey: queryKeys.members,
    queryFn: ({ signal }) => apiFetch<MembersResponse>("/api/shop/members", { signal }),
  });
}

export function useInviteMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: { email: string; role: ShopRole }) =>
      (await apiFetch<{ invitation: Invitation }>("/api/shop/invitations", { method: "POST", body: input })).invitation,
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.members }),
  });
}

export function useChangeMemberRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, role }: { id: string; role: ShopRole }) =>
      (await apiFetch<{ member: Member }>(`/api/shop/members/${encodeURIComponent(id)}`, { method: "PATCH", body: { role } })).member,
    onSuccess: () => Promise.all([client.invalidateQueries({ queryKey: queryKeys.members }), client.invalidateQueries({ queryKey: queryKeys.me })]),
  });
}

export function useRemoveMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/api/shop/members/${encodeURIComponent(id)}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.members }),
  });
}

export function useRevokeInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/api/shop/invitations/${encodeURIComponent(id)}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.members }),
  });
}
