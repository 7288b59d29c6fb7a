/** TanStack Query keys of the pattern results screen and the scan upload. */
export const patternKeys = {
  pattern: (id: string) => ["patterns", id] as const,
  heatmap: (id: string, label: string) => ["patterns", id, "heatmap", label] as const,
  viewerMesh: (scanId: string) => ["scans", scanId, "mesh"] as const,
  scan: (scanId: string) => ["scans", scanId] as const,
};
