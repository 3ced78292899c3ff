// Reads the JSON reports of vitest and Playwright so the test run ends with one honest count.
import { existsSync, readFileSync } from 'node:fs';

export interface Counts {
  passed: number;
  failed: number;
  skipped: number;
}

const none: Counts = { passed: 0, failed: 0, skipped: 0 };

/** Counts from a vitest `--reporter=json` file (Jest-compatible shape). */
export function readVitestCounts(file: string): Counts | null {
  if (!existsSync(file)) return null;
  const report = JSON.parse(readFileSync(file, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
    testResults?: { status: string; assertionResults: unknown[] }[];
  };
  // A file that fails before any test runs (its set-up threw) has no failed test of its own;
  // it counts as one failure, so the total never says 0 failed for a failed step.
  const brokenFiles = (report.testResults ?? []).filter(
    (file) => file.status === 'failed' && file.assertionResults.length === 0,
  ).length;
  return {
    passed: report.numPassedTests,
    failed: report.numFailedTests + brokenFiles,
    skipped: report.numPendingTests + report.numTodoTests,
  };
}

/** Counts from a Playwright JSON report. */
export function readPlaywrightCounts(file: string): Counts | null {
  if (!existsSync(file)) return null;
  const report = JSON.parse(readFileSync(file, 'utf8')) as {
    stats: { expected: number; unexpected: number; flaky: number; skipped: number };
  };
  return {
    passed: report.stats.expected + report.stats.flaky,
    failed: report.stats.unexpected,
    skipped: report.stats.skipped,
  };
}

export function addCounts(a: Counts, b: Counts | null): Counts {
  if (!b) return a;
  return {
    passed: a.passed + b.passed,
    failed: a.failed + b.failed,
    skipped: a.skipped + b.skipped,
  };
}

export const zeroCounts = none;
