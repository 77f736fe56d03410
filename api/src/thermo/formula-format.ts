import type { ParsedFormula } from './formula';

/**
 * Order of symbols in the Hill system: with carbon, C first, then H, then the rest
 * alphabetically; without carbon, all alphabetically (H included). Isotope symbols (D, T)
 * sort alphabetically like element symbols.
 */
export function hillOrder(symbols: Iterable<string>): string[] {
  const list = [...symbols];
  const hasCarbon = list.includes('C');
  const alphabetical = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  if (!hasCarbon) return list.sort(alphabetical);
  const rest = list.filter((s) => s !== 'C' && s !== 'H').sort(alphabetical);
  return ['C', ...(list.includes('H') ? ['H'] : []), ...rest];
}

/** A count as written in a formula: omitted when 1, shortest decimal otherwise. */
function formatCount(count: number): string {
  return count === 1 ? '' : String(count);
}

/**
 * Charge suffix in the form our parser reads back: '+' or '-' for ±1, '+n' or '-n' for
 * larger charges (SO4²⁻ → "-2"), '' for a neutral species.
 */
export function formatCharge(charge: number): string {
  if (charge === 0) return '';
  const sign = charge > 0 ? '+' : '-';
  const magnitude = Math.abs(charge);
  return magnitude === 1 ? sign : `${sign}${magnitude}`;
}

/**
 * Hill formula of a parsed formula, charge appended in `formatCharge` form:
 * CH3OH → "CH4O", Ca(OH)2 → "CaH2O2", CuSO4·5H2O → "CuH10O9S", NH4+ → "H4N+",
 * SO4^2- → "O4S-2", e- → "e-". The result parses back to the same counts and charge.
 */
export function hillFormula(formula: ParsedFormula): string {
  if (formula.isElectron) return 'e-';
  let text = '';
  for (const symbol of hillOrder(Object.keys(formula.elements))) {
    text += symbol + formatCount(formula.elements[symbol]);
  }
  return text + formatCharge(formula.charge);
}
