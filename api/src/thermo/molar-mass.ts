import { ATOMIC_WEIGHTS } from './atomic-weights';
import type { ParsedFormula } from './formula';

/**
 * Molar mass of the electron / (g/mol): CODATA 2018 relative atomic mass of the electron,
 * 5.485 799 090 65 × 10⁻⁴ (from memory), times M_u ≈ 1 g/mol.
 */
export const ELECTRON_MOLAR_MASS = 5.48579909065e-4;

/**
 * Molar mass / (g/mol) from IUPAC/CIAAW 2021 atomic weights (see atomic-weights.ts).
 *
 * Ions: by default the electron mass is neglected, as is common practice (it is below the
 * uncertainty of the conventional atomic weights, e.g. 4 × 0.0002 for the H of NH4+);
 * pass `includeElectronMass: true` to subtract z·M(e). The electron `e-` itself always has
 * the electron's molar mass.
 */
export function molarMass(formula: ParsedFormula, options: { includeElectronMass?: boolean } = {}): number {
  if (formula.isElectron) return ELECTRON_MOLAR_MASS;
  let mass = 0;
  for (const symbol in formula.elements) {
    // The parser only admits symbols present in the table.
    mass += formula.elements[symbol] * ATOMIC_WEIGHTS.get(symbol)!.weight;
  }
  if (options.includeElectronMass) mass -= formula.charge * ELECTRON_MOLAR_MASS;
  return mass;
}
