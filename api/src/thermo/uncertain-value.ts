import { ThermoInputError } from './errors';

/**
 * A value with its standard uncertainty u (GUM, JCGM 100:2008), in the unit of the value.
 * Every value the engine computes with carries one; an exact value has uncertainty 0.
 */
export interface UncertainValue {
  readonly value: number;
  /** standard uncertainty u (coverage factor k = 1), same unit as `value` */
  readonly uncertainty: number;
}

/** An exact value (uncertainty 0), e.g. ΔfH° of an element in its reference state. */
export function exact(value: number): UncertainValue {
  return { value, uncertainty: 0 };
}

/**
 * Standard uncertainty from an expanded uncertainty: u = U / k (GUM 6.2.1).
 * @param expanded expanded uncertainty U (same unit as the value)
 * @param coverageFactor k, e.g. 2 for ≈95 % coverage
 */
export function standardFromExpanded(expanded: number, coverageFactor: number): number {
  if (!(coverageFactor > 0) || !Number.isFinite(coverageFactor)) {
    throw new ThermoInputError('coverageFactor', `must be a positive number, got ${coverageFactor}`);
  }
  if (!(expanded >= 0) || !Number.isFinite(expanded)) {
    throw new ThermoInputError('expanded', `must be a non-negative number, got ${expanded}`);
  }
  return expanded / coverageFactor;
}

/** Expanded uncertainty U = k·u. */
export function expandedFromStandard(standard: number, coverageFactor: number): number {
  if (!(coverageFactor > 0) || !Number.isFinite(coverageFactor)) {
    throw new ThermoInputError('coverageFactor', `must be a positive number, got ${coverageFactor}`);
  }
  return standard * coverageFactor;
}

/**
 * Σ νᵢ·xᵢ with uncorrelated propagation u = sqrt(Σ νᵢ²·uᵢ²) (GUM eq. 10, linear model).
 */
export function weightedSum(terms: ReadonlyArray<{ coefficient: number; value: UncertainValue }>): UncertainValue {
  let value = 0;
  let variance = 0;
  for (const { coefficient, value: x } of terms) {
    value += coefficient * x.value;
    variance += coefficient * coefficient * x.uncertainty * x.uncertainty;
  }
  return { value, uncertainty: Math.sqrt(variance) };
}
