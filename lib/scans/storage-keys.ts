import type { PaperId } from "@/lib/patterns/paper-sizes";

/**
 * Object keys derived from ids only: a retried job writes the same keys again (overwrite), never new ones.
 * Piece labels are A…Z, AA…, safe in keys.
 */
export const scanKeys = (scanId: string) => ({
  original: `scans/${scanId}/original`,
  working: `scans/${scanId}/working-mesh.bin`,
  intake: `scans/${scanId}/intake.bin`,
});

export const patternKeys = (patternId: string) => ({
  report: `patterns/${patternId}/report.json`,
  svg: `patterns/${patternId}/pattern.svg`,
  pdf: (paper: PaperId) => `patterns/${patternId}/pattern-${paper}.pdf`,
  heatmap: (label: string) => `patterns/${patternId}/pieces/${label}.bin`,
});
