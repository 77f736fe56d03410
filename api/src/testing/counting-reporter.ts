import { writeFileSync } from 'node:fs';

/**
 * Writes `{suite, passed, failed}` to KELVINDEX_COUNTS_FILE when a jasmine run ends, so `npm test`
 * can print one grand total. A pending (skipped) spec counts as failed: skipping is a defect here.
 */
export function installCountingReporter(suite: string): void {
  const file = process.env.KELVINDEX_COUNTS_FILE;
  if (!file) return;
  let passed = 0;
  let failed = 0;
  jasmine.getEnv().addReporter({
    specDone(result) {
      if (result.status === 'passed') passed++;
      else if (result.status !== 'excluded') failed++;
    },
    suiteDone(result) {
      // afterAll failures belong to no spec; they still fail the run.
      if (result.failedExpectations.length > 0) failed++;
    },
    jasmineDone(result) {
      if (result.failedExpectations.length > 0) failed++;
      writeFileSync(file, JSON.stringify({ suite, passed, failed }));
    },
  });
}
