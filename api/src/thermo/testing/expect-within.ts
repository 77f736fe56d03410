/**
 * `expect(actual)` to lie within ±tolerance of `expected`, with a message naming the check.
 * Used by the thermo specs, whose tolerances are the rounding or the stated agreement of the
 * published source.
 */
export function expectWithin(actual: number, expected: number, tolerance: number, what: string): void {
  expect(Number.isFinite(actual)).withContext(`${what}: finite`).toBeTrue();
  expect(Math.abs(actual - expected))
    .withContext(`${what}: got ${actual}, expected ${expected} ± ${tolerance}`)
    .toBeLessThanOrEqual(tolerance);
}
