import { ThermoInputError } from './errors';

/**
 * A compiled heat-capacity function: evaluates Cp, H − H(298.15 K) and S at T without
 * allocating, for the hot loops of reaction profiles. Built by `compileHeatCapacity`.
 */
export interface ThermoKernel {
  /** lower end of the valid range / K */
  readonly tMin: number;
  /** upper end of the valid range / K */
  readonly tMax: number;
  /**
   * Writes out[offset] = Cp° / (J mol⁻¹ K⁻¹), out[offset + 1] = H°(T) − H°(298.15 K) / (J mol⁻¹),
   * out[offset + 2] = S°(T) / (J mol⁻¹ K⁻¹).
   * @returns true when T lies outside every range, so the nearest range was extrapolated
   */
  evaluate(temperature: number, out: Float64Array, offset: number): boolean;
}

/** A temperature interval of a fit / K. */
export interface TemperatureRange {
  readonly tMin: number;
  readonly tMax: number;
}

/**
 * Index of the range containing T (the lower range at a joint, as in the NASA convention),
 * or, when T is in no range, −(nearest index) − 1 so the caller can extrapolate it.
 */
export function findRange(ranges: readonly TemperatureRange[], temperature: number): number {
  for (let i = 0; i < ranges.length; i++) {
    if (temperature <= ranges[i].tMax) {
      if (temperature >= ranges[i].tMin) return i;
      if (i === 0) return -1;
      // In a gap between ranges: extrapolate the closer neighbour.
      const below = temperature - ranges[i - 1].tMax;
      const above = ranges[i].tMin - temperature;
      return below <= above ? -i : -(i + 1);
    }
  }
  return -ranges.length;
}

/** Range index from `findRange`, extrapolating when outside (flag returned separately). */
export function rangeIndexOrNearest(code: number): number {
  return code >= 0 ? code : -code - 1;
}

/**
 * Checks that ranges are positive, non-empty, ascending and non-overlapping.
 * @throws ThermoInputError naming the first problem
 */
export function validateRanges(ranges: readonly TemperatureRange[], field: string): void {
  if (ranges.length === 0) throw new ThermoInputError(field, 'at least one temperature range is required');
  ranges.forEach((r, i) => {
    if (!(Number.isFinite(r.tMin) && Number.isFinite(r.tMax) && r.tMin > 0 && r.tMax > r.tMin)) {
      throw new ThermoInputError(`${field}[${i}]`, `invalid range ${r.tMin}–${r.tMax} K`);
    }
    if (i > 0 && r.tMin < ranges[i - 1].tMax) {
      throw new ThermoInputError(`${field}[${i}]`, `range ${r.tMin}–${r.tMax} K overlaps or precedes the previous one`);
    }
  });
}

/** Checks that a coefficient list has the expected length and only finite numbers. */
export function validateCoefficients(values: readonly number[], length: number, field: string): void {
  if (values.length !== length) {
    throw new ThermoInputError(field, `expected ${length} coefficients, got ${values.length}`);
  }
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new ThermoInputError(`${field}[${i}]`, `not a finite number: ${v}`);
  });
}
