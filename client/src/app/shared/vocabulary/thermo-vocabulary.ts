/**
 * The codes the API stores for quantities, phases, methods and fits (see api/src/values/
 * value-vocabulary.ts and api/src/species/phase-code.ts), with the words and IUPAC symbols the
 * editorial screens show for them.
 */

export type QuantityCode = 'dfH' | 'S' | 'Cp' | 'dfG' | 'dtrsH';
export type TransitionKind = 'fus' | 'vap' | 'sub' | 'trs';
export type UncertaintyKind = 'standard' | 'expanded';
export type ValueMethod = 'measured' | 'evaluated' | 'computed' | 'estimated';
export type PhaseCode = 'g' | 'l' | 'cr' | 'am' | 'aq' | 'aq,inf';
export type FitForm = 'constant' | 'shomate' | 'nasa7' | 'nasa9' | 'tabulated';

/** 1 bar (IUPAC since 1982) or 1 atm (older tables), in Pa. */
export type StandardPressure = 100000 | 101325;

export interface Choice<T> {
  readonly value: T;
  readonly label: string;
}

export const QUANTITIES: readonly Choice<QuantityCode>[] = [
  { value: 'dfH', label: 'ΔfH° standard enthalpy of formation' },
  { value: 'dfG', label: 'ΔfG° standard Gibbs energy of formation' },
  { value: 'S', label: 'S° standard molar entropy' },
  { value: 'Cp', label: 'Cp° standard molar heat capacity' },
  { value: 'dtrsH', label: 'ΔtrsH enthalpy of transition' },
];

export const QUANTITY_SYMBOLS: Readonly<Record<QuantityCode, string>> = {
  dfH: 'ΔfH°',
  dfG: 'ΔfG°',
  S: 'S°',
  Cp: 'Cp°',
  dtrsH: 'ΔtrsH',
};

export const TRANSITIONS: readonly Choice<TransitionKind>[] = [
  { value: 'fus', label: 'fusion (ΔfusH)' },
  { value: 'vap', label: 'vaporisation (ΔvapH)' },
  { value: 'sub', label: 'sublimation (ΔsubH)' },
  { value: 'trs', label: 'solid–solid transition (ΔtrsH)' },
];

export const METHODS: readonly Choice<ValueMethod>[] = [
  { value: 'measured', label: 'measured' },
  { value: 'evaluated', label: 'critically evaluated' },
  { value: 'computed', label: 'computed' },
  { value: 'estimated', label: 'estimated' },
];

export const PHASES: readonly Choice<PhaseCode>[] = [
  { value: 'g', label: 'g — gas' },
  { value: 'l', label: 'l — liquid' },
  { value: 'cr', label: 'cr — crystalline solid' },
  { value: 'am', label: 'am — amorphous solid' },
  { value: 'aq', label: 'aq — aqueous solution' },
  { value: 'aq,inf', label: 'aq, ∞ — aqueous, infinite dilution' },
];

/** Phases that may carry a polymorph or modification label (cr, graphite). */
export const PHASES_WITH_POLYMORPH: readonly PhaseCode[] = ['cr', 'am', 'l'];

export const STANDARD_PRESSURES: readonly Choice<StandardPressure>[] = [
  { value: 100000, label: '1 bar (100 000 Pa)' },
  { value: 101325, label: '1 atm (101 325 Pa)' },
];

export const FIT_FORMS: readonly Choice<FitForm>[] = [
  { value: 'shomate', label: 'Shomate (A…H, t = T/1000 K)' },
  { value: 'nasa7', label: 'NASA 7-coefficient (a1…a7)' },
  { value: 'nasa9', label: 'NASA 9-coefficient (a1…a7, b1, b2)' },
  { value: 'constant', label: 'constant Cp°' },
  { value: 'tabulated', label: 'tabulated points (T, Cp°)' },
];

/** Coefficients each range of a coefficient form holds. */
export const COEFFICIENT_COUNTS: Readonly<Record<Exclude<FitForm, 'tabulated'>, number>> = {
  constant: 1,
  shomate: 8,
  nasa7: 7,
  nasa9: 9,
};

const MOLAR_ENERGY_QUANTITIES: readonly QuantityCode[] = ['dfH', 'dfG', 'dtrsH'];

/** True for quantities measured per amount of substance only (J/mol), false for J/(mol·K). */
export function isMolarEnergy(quantity: QuantityCode): boolean {
  return MOLAR_ENERGY_QUANTITIES.includes(quantity);
}

/** The units the API reads for a quantity, the usual one first (cal is the thermochemical calorie). */
export function unitsFor(quantity: QuantityCode): readonly string[] {
  return isMolarEnergy(quantity) ? ['kJ/mol', 'kcal/mol', 'J/mol', 'cal/mol'] : ['J/(mol·K)', 'cal/(mol·K)'];
}

/** The SI unit a quantity is stored in. */
export function siUnitFor(quantity: QuantityCode): 'J/mol' | 'J/(mol·K)' {
  return isMolarEnergy(quantity) ? 'J/mol' : 'J/(mol·K)';
}

/** The symbol with the transition, e.g. ΔvapH for a ΔtrsH value of kind vap. */
export function quantitySymbol(quantity: QuantityCode, transition?: TransitionKind | null): string {
  return quantity === 'dtrsH' && transition && transition !== 'trs' ? `Δ${transition}H` : QUANTITY_SYMBOLS[quantity];
}

/** An IUPAC phase label as the screens show it: `l`, `cr, graphite`, `aq, ∞`. */
export function phaseText(phase: string, polymorph?: string | null): string {
  if (phase === 'aq,inf') {
    return 'aq, ∞';
  }
  return polymorph ? `${phase}, ${polymorph}` : phase;
}
