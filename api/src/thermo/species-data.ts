import type { HeatCapacityFunction } from './heat-capacity';
import type { UncertainValue } from './uncertain-value';

/** What the engine needs to know about one species in one phase (SI units). */
export interface SpeciesThermoData {
  /** label for messages, e.g. "H2O(g)" */
  readonly label?: string;
  /** atoms per formula unit (ParsedFormula.elements) */
  readonly elements: Readonly<Record<string, number>>;
  /** charge number z; 0 when omitted */
  readonly charge?: number;
  /** ΔfH°(298.15 K) / (J mol⁻¹) with its standard uncertainty */
  readonly formationEnthalpy: UncertainValue;
  /** S°(298.15 K) / (J mol⁻¹ K⁻¹) with its standard uncertainty */
  readonly entropy: UncertainValue;
  /** Cp°(T) function; constant and tabulated forms are anchored at `entropy.value` */
  readonly heatCapacity: HeatCapacityFunction;
  /**
   * standard uncertainty of Cp° / (J mol⁻¹ K⁻¹), taken as the same at every T; it makes the
   * increments uncertain by u·|T − 298.15| (H) and u·|ln(T/298.15)| (S). 0 when omitted.
   */
  readonly heatCapacityUncertainty?: number;
}

/**
 * The reference-state species of one element, e.g. O2(g) for O (atoms = 2),
 * C(cr, graphite) for C (atoms = 1). ΔfH° of a reference state is 0 by definition.
 * Key 'e-' holds the electron reference for ions (the tables' electron convention).
 */
export interface ElementReference {
  readonly label?: string;
  /** atoms of the element per formula unit of the reference species */
  readonly atoms: number;
  /** S°(298.15 K) / (J mol⁻¹ K⁻¹) */
  readonly entropy: UncertainValue;
  readonly heatCapacity: HeatCapacityFunction;
  readonly heatCapacityUncertainty?: number;
}

/** Element symbol (or 'e-') → its reference-state species. */
export type ElementReferences = Readonly<Record<string, ElementReference>>;
