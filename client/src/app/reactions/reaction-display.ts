import { quantityText } from '../shared/quantity/quantity';
import { MolarEnergyUnit, convertFromKilojoulesPerMole, convertFromSi } from '../shared/unit-selector/molar-energy-unit';
import { ReactionQuantity } from './reactions-api';

export interface ShownQuantity {
  readonly value: number;
  readonly uncertainty: number | null;
  readonly unit: string;
}

/** Converts a reaction result (ΔrH°, ΔrG° in kJ/mol; ΔrS°, ΔrCp° in J/(mol·K)) to the page's unit. */
export function showReactionQuantity(quantity: ReactionQuantity, defaultUnit: string, unit: MolarEnergyUnit): ShownQuantity {
  const from = quantity.unit ?? defaultUnit;
  if (from === 'kJ/mol') {
    return {
      value: convertFromKilojoulesPerMole(quantity.value, unit),
      uncertainty: quantity.uncertainty === null ? null : convertFromKilojoulesPerMole(quantity.uncertainty, unit),
      unit,
    };
  }
  const converted = convertFromSi(quantity.value, from, unit);
  return {
    value: converted.value,
    uncertainty: quantity.uncertainty === null ? null : convertFromSi(quantity.uncertainty, from, unit).value,
    unit: converted.unit,
  };
}

/** An equilibrium constant to four significant digits, with a power of ten when large or small. */
export function equilibriumConstantText(k: number): string {
  if (!Number.isFinite(k)) {
    return k > 0 ? 'beyond 10³⁰⁸' : '—';
  }
  if (k === 0) {
    return 'below 10⁻³⁰⁸';
  }
  return quantityText(Number(k.toPrecision(4)), null) ?? '—';
}
