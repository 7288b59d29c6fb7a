/** TanStack Query keys, in one place so mutations invalidate exactly what they change. */
export const queryKeys = {
  me: ["me"] as const,
  projects: ["projects"] as const,
  project: (id: string) => ["projects", id] as const,
  members: ["shop", "members"] as const,
};
