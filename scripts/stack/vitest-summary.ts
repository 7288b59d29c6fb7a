import fs from "node:fs";

/**
 * Counts from vitest's JSON reports, e.g. "vitest: 41 passed, 0 failed, 2 skipped", so a CI log ends with one
 * plain line of totals whatever the reporters printed above. A test file that fails to load (no test results but
 * status "failed") counts as one failure.
 */
export interface VitestCounts {
  passed: number;
  failed: number;
  skipped: number;
}

interface Report {
  numPassedTests?: number;
  numFailedTests?: number;
  numPendingTests?: number;
  numTodoTests?: number;
  testResults?: { status: string; assertionResults: unknown[] }[];
}

export function readVitestCounts(reportFile: string): VitestCounts | null {
  try {
    const report = JSON.parse(fs.readFileSync(reportFile, "utf8")) as Report;
    const brokenFiles = (report.testResults ?? []).filter((r) => r.status === "failed" && r.assertionResults.length === 0).length;
    return {
      passed: report.numPassedTests ?? 0,
      failed: (report.numFailedTests ?? 0) + brokenFiles,
      skipped: (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0),
    };
  } catch {
    return null;
  }
}

export function formatVitestCounts(counts: VitestCounts): string {
  return `vitest: ${counts.passed} passed, ${counts.failed} failed` + (counts.skipped ? `, ${counts.skipped} skipped` : "");
}
