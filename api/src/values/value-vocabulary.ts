/**
 * Codes the database stores for thermochemical values and fits (ASCII, stable; the client shows
 * the IUPAC symbols). Each list matches a CHECK constraint in migrations/1764800200000-catalogue.ts.
 */

/** ΔfH°, S°, Cp°, ΔfG°, ΔtrsH. */
export const QUANTITIES = ['dfH', 'S', 'Cp', 'dfG', 'dtrsH'] as const;
export type Quantity = (typeof QUANTITIES)[number];

/** IUPAC Green Book symbol of each quantity. */
export const QUANTITY_SYMBOLS: Readonly<Record<Quantity, string>> = {
  dfH: 'ΔfH°',
  S: 'S°',
  Cp: 'Cp°',
  dfG: 'ΔfG°',
  dtrsH: 'ΔtrsH',
};

/** The SI unit a quantity is stored in (`value_si`, `uncertainty_si`). */
export const SI_UNITS: Readonly<Record<Quantity, 'J/mol' | 'J/(mol·K)'>> = {
  dfH: 'J/mol',
  S: 'J/(mol·K)',
  Cp: 'J/(mol·K)',
  dfG: 'J/mol',
  dtrsH: 'J/mol',
};

/** Transition of a ΔtrsH value: fusion, vaporisation, sublimation, solid–solid (Green Book subscripts). */
export const TRANSITION_KINDS = ['fus', 'vap', 'sub', 'trs'] as const;
export type TransitionKind = (typeof TRANSITION_KINDS)[number];

/** GUM: standard uncertainty u, or expanded uncertainty U = k·u with its coverage factor k. */
export const UNCERTAINTY_KINDS = ['standard', 'expanded'] as const;
export type UncertaintyKind = (typeof UNCERTAINTY_KINDS)[number];

/** How a value was obtained; `computed` also records the level of theory. */
export const METHODS = ['measured', 'evaluated', 'computed', 'estimated'] as const;
export type Method = (typeof METHODS)[number];

/** Standard pressures a value may be stated at / Pa: 1 bar (IUPAC since 1982) or 1 atm (older tables). */
export const STANDARD_PRESSURES = [100000, 101325] as const;
export type StandardPressure = (typeof STANDARD_PRESSURES)[number];

/** Heat-capacity function forms; see api/src/values/fit-ranges.ts for their coefficients and units. */
export const FIT_FORMS = ['constant', 'shomate', 'nasa7', 'nasa9', 'tabulated'] as const;
export type FitForm = (typeof FIT_FORMS)[number];
