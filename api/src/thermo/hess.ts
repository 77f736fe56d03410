import { ThermoInputError } from './errors';
import type { UncertainValue } from './uncertain-value';

/** A participant of the measured reaction: ν signed (< 0 reactants), ΔfH° or null if sought. */
export interface HessTerm {
  readonly label: string;
  readonly nu: number;
  /** ΔfH°(298.15 K) / (J mol⁻¹), or null for the one species whose value is derived */
  readonly formationEnthalpy: UncertainValue | null;
}

/** A formation enthalpy derived by Hess's law, with its uncertainty budget. */
export interface DerivedFormationEnthalpy {
  readonly label: string;
  /** ΔfH° / (J mol⁻¹) with standard uncertainty */
  readonly formationEnthalpy: UncertainValue;
  /** each input's contribution |∂ΔfH/∂xᵢ|·u(xᵢ) / (J mol⁻¹), largest first */
  readonly budget: ReadonlyArray<{ readonly source: string; readonly contribution: number }>;
}

/**
 * Hess's law in reverse: from a measured reaction enthalpy ΔrH° = Σ νᵢ·ΔfH°ᵢ (e.g. a
 * combustion) and the other participants' ΔfH°, the one unknown ΔfH°ₓ =
 * (ΔrH° − Σ_{i≠x} νᵢ·ΔfH°ᵢ)/νₓ, with u² = [u²(ΔrH°) + Σ νᵢ²u²ᵢ]/νₓ² (GUM, uncorrelated).
 *
 * @param reactionEnthalpy measured ΔrH° / (J mol⁻¹) for the reaction as written by `terms`
 * @throws ThermoInputError unless exactly one term has formationEnthalpy null and ν ≠ 0
 */
export function deriveFormationEnthalpy(
  reactionEnthalpy: UncertainValue,
  terms: readonly HessTerm[],
): DerivedFormationEnthalpy {
  const unknown = terms.filter((t) => t.formationEnthalpy === null);
  if (unknown.length !== 1) {
    throw new ThermoInputError('terms', `exactly one species must have an unknown ΔfH° (found ${unknown.length})`);
  }
  const target = unknown[0];
  if (!Number.isFinite(target.nu) || target.nu === 0) {
    throw new ThermoInputError('terms', `${target.label} needs a non-zero stoichiometric number`);
  }
  let rest = reactionEnthalpy.value;
  const budget: Array<{ source: string; contribution: number }> = [
    { source: 'measured ΔrH°', contribution: reactionEnthalpy.uncertainty / Math.abs(target.nu) },
  ];
  for (const term of terms) {
    if (term === target) continue;
    const x = term.formationEnthalpy!;
    rest -= term.nu * x.value;
    budget.push({ source: term.label, contribution: Math.abs(term.nu / target.nu) * x.uncertainty });
  }
  const uncertainty = Math.sqrt(budget.reduce((sum, b) => sum + b.contribution ** 2, 0));
  budget.sort((a, b) => b.contribution - a.contribution);
  return { label: target.label, formationEnthalpy: { value: rest / target.nu, uncertainty }, budget };
}
