import fs from "node:fs";

/**
 * One plain closing line from vitest's JSON report, e.g. "vitest: 41 passed, 0 failed, 2 skipped", so a CI log
 * ends with the counts whatever the reporters printed above.
 */
export function summariseVitest(reportFile: string): string | null {
  try {
    const report = JSON.parse(fs.readFileSync(reportFile, "utf8")) as {
      numPassedTests?: number;
      numFailedTests?: number;
      numPendingTests?: number;
      numTodoTests?: number;
      numFailedTestSuites?: number;
    };
    const skipped = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
    // A test file that fails to load counts as a failure too.
    const failed = (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0);
    return `vitest: ${report.numPassedTests ?? 0} passed, ${failed} failed` + (skipped ? `, ${skipped} skipped` : "");
  } catch {
    return null;
  }
}
