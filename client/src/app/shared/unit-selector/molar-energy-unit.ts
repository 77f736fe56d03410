export type MolarEnergyUnit = 'kJ/mol' | 'kcal/mol';

export const MOLAR_ENERGY_UNITS: readonly MolarEnergyUnit[] = ['kJ/mol', 'kcal/mol'];

/** The thermochemical calorie: 1 cal = 4.184 J exactly (so 1 kcal/mol = 4.184 kJ/mol). */
export const JOULES_PER_THERMOCHEMICAL_CALORIE = 4.184;

/**
 * Converts a molar energy (an enthalpy or Gibbs energy) stored in kJ/mol to `unit`. Apply it to
 * the value and to its uncertainty alike: the conversion is an exact scale factor.
 */
export function convertFromKilojoulesPerMole(kilojoulesPerMole: number, unit: MolarEnergyUnit): number {
  return unit === 'kcal/mol' ? kilojoulesPerMole / JOULES_PER_THERMOCHEMICAL_CALORIE : kilojoulesPerMole;
}

/** The unit molar entropies and heat capacities are shown in beside energies in `unit`. */
export function molarEntropyUnitFor(unit: MolarEnergyUnit): string {
  return unit === 'kcal/mol' ? 'cal/(mol·K)' : 'J/(mol·K)';
}

/**
 * Converts a value stored in SI (`J/mol`, or `J/(mol·K)` for entropies and heat capacities) to
 * the display unit that goes with `unit`: kJ/mol or kcal/mol, and J/(mol·K) or cal/(mol·K).
 * Other units pass through unchanged. Apply it to the value and its uncertainty alike.
 */
export function convertFromSi(value: number, siUnit: string, unit: MolarEnergyUnit): { value: number; unit: string } {
  if (siUnit === 'J/mol') {
    return { value: convertFromKilojoulesPerMole(value / 1000, unit), unit };
  }
  if (siUnit === 'J/(mol·K)' || siUnit === 'J/(mol K)' || siUnit === 'J/mol/K') {
    return {
      value: unit === 'kcal/mol' ? value / JOULES_PER_THERMOCHEMICAL_CALORIE : value,
      unit: molarEntropyUnitFor(unit),
    };
  }
  return { value, unit: siUnit };
}
