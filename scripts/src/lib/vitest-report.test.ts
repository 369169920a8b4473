import { describe, expect, it } from 'vitest';
import { parseStageArgs, STAGE_NAMES } from './stages.js';
import { addTotals, formatTotals, totalsFromReport } from './vitest-report.js';

describe('totalsFromReport', () => {
  it('reads passed, failed and skipped (pending + todo) counts', () => {
    expect(
      totalsFromReport({
        numPassedTests: 12,
        numFailedTests: 1,
        numPendingTests: 2,
        numTodoTests: 1,
        testResults: [],
      }),
    ).toEqual({ passed: 12, failed: 1, skipped: 3 });
  });

  it('counts a test file that failed before running any test as a failure', () => {
    const report = {
      numPassedTests: 3,
      numFailedTests: 0,
      testResults: [
        { status: 'passed', assertionResults: [{}, {}, {}] },
        { status: 'failed', assertionResults: [] },
      ],
    };
    expect(totalsFromReport(report)).toEqual({ passed: 3, failed: 1, skipped: 0 });
  });

  it('treats an empty report as zero', () => {
    expect(totalsFromReport({})).toEqual({ passed: 0, failed: 0, skipped: 0 });
  });
});

describe('formatTotals', () => {
  it('prints the summary line without skipped tests', () => {
    expect(formatTotals({ passed: 123, failed: 0, skipped: 0 })).toBe('Tests: 123 passed, 0 failed');
  });

  it('adds skipped tests when there are any', () => {
    expect(
      formatTotals(addTotals({ passed: 1, failed: 1, skipped: 0 }, { passed: 2, failed: 0, skipped: 4 })),
    ).toBe('Tests: 3 passed, 1 failed, 4 skipped');
  });
});

describe('parseStageArgs', () => {
  it('runs every stage without arguments', () => {
    expect(parseStageArgs([])).toEqual([...STAGE_NAMES]);
  });

  it('keeps pipeline order whatever the argument order', () => {
    expect(parseStageArgs(['e2e', '--', 'unit'])).toEqual(['unit', 'e2e']);
  });

  it('rejects unknown stages with the list of valid ones', () => {
    expect(() => parseStageArgs(['unit', 'smoke'])).toThrow(
      /Unknown test stage "smoke"; choose from lint, format/,
    );
  });
});
