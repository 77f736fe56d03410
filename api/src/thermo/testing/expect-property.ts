import fc from 'fast-check';

/**
 * Runs a fast-check property as jasmine expectations: the run must not fail (the message
 * carries fast-check's counterexample) and must have run at least once.
 */
export function expectProperty<Ts>(property: fc.IProperty<Ts>, params?: fc.Parameters<Ts>): void {
  const details = fc.check(property, params);
  expect(details.failed).withContext(fc.defaultReportMessage(details) ?? 'property failed').toBeFalse();
  expect(details.numRuns).withContext('runs').toBeGreaterThan(0);
}
