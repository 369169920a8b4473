import { existsSync, readFileSync } from 'node:fs';

export interface TestTotals {
  passed: number;
  failed: number;
  skipped: number;
}

interface JsonReport {
  numPassedTests?: number;
  numFailedTests?: number;
  numPendingTests?: number;
  numTodoTests?: number;
  testResults?: { status?: string; assertionResults?: unknown[] }[];
}

/**
 * Totals from one vitest JSON report. A test file that failed without running any test (an import or
 * hook error) counts as one failure, so a red run never reads "0 failed".
 */
export function totalsFromReport(report: JsonReport): TestTotals {
  const brokenFiles = (report.testResults ?? []).filter(
    (file) => file.status === 'failed' && (file.assertionResults?.length ?? 0) === 0,
  ).length;
  return {
    passed: report.numPassedTests ?? 0,
    failed: (report.numFailedTests ?? 0) + brokenFiles,
    skipped: (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0),
  };
}

export function readTotals(file: string): TestTotals | undefined {
  if (!existsSync(file)) return undefined;
  try {
    return totalsFromReport(JSON.parse(readFileSync(file, 'utf8')) as JsonReport);
  } catch {
    return undefined;
  }
}

export function addTotals(a: TestTotals, b: TestTotals): TestTotals {
  return { passed: a.passed + b.passed, failed: a.failed + b.failed, skipped: a.skipped + b.skipped };
}

/** The final line of `npm test`, e.g. "Tests: 123 passed, 0 failed" or "…, 2 skipped". */
export function formatTotals(totals: TestTotals): string {
  const line = `Tests: ${totals.passed} passed, ${totals.failed} failed`;
  return totals.skipped > 0 ? `${line}, ${totals.skipped} skipped` : line;
}
