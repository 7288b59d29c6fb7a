"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "./api-fetch";
import type { Project } from "./api-types";
import { queryKeys } from "./query-keys";

export type ProjectInput = {
  name: string;
  client?: string | null;
  dueDate?: string | null;
  notes?: string | null;
  status?: Project["status"];
};

export function useProjects(initial?: Project[]) {
  return useQuery({
    queryKey: queryKeys.projects,
    queryFn: async ({ signal }) => (await apiFetch<{ projects: Project[] }>("/api/projects", { signal })).projects,
    initialData: initial,
  });
}

export function useProject(id: string, initial?: Project) {
  return useQuery({
    queryKey: queryKeys.project(id),
    queryFn: async ({ signal }) => (await apiFetch<{ project: Project }>(`/api/projects/${encodeURIComponent(id)}`, { signal })).project,
    initialData: initial,
  });
}

export function useCreateProject() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: ProjectInput) =>
      (await apiFetch<{ project: Project }>("/api/projects", { method: "POST", body: input })).project,
    onSuccess: (project) => {
      client.setQueryData(queryKeys.project(project.id), project);
      return client.invalidateQueries({ queryKey: queryKeys.projects });
    },
  });
}

export function useUpdateProject(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (patch: Partial<ProjectInput>) =>
      (await apiFetch<{ project: Project }>(`/api/projects/${encodeURIComponent(id)}`, { method: "PATCH", body: patch })).project,
    onSuccess: (project) => {
      client.setQueryData(queryKeys.project(id), project);
      return client.invalidateQueries({ queryKey: queryKeys.projects, exact: true });
    },
  });
}

export function useDeleteProject(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>(`/api/projects/${encodeURIComponent(id)}`, { method: "DELETE" }),
    onSuccess: () => {
      client.removeQueries({ queryKey: queryKeys.project(id) });
      return client.invalidateQueries({ queryKey: queryKeys.projects, exact: true });
    },
  });
}
