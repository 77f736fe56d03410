/**
 * Kelvindex thermochemistry engine: pure functions and value types, no I/O.
 * All quantities are SI internally (J/mol, J/(mol·K), K, Pa) unless a name says otherwise.
 */
export * from './adiabatic-rise';
export * from './atomic-weights';
export * from './balance';
export * from './consistency-checks';
export * from './constants';
export * from './errors';
export * from './formula';
export * from './formula-format';
export * from './heat-capacity';
export * from './hess';
export * from './molar-mass';
export * from './nasa7-fit';
export { nasa7RangeAt } from './nasa7';
export { nasa9RangeAt } from './nasa9';
export * from './phase';
export * from './rational';
export * from './reaction';
export * from './reaction-thermo';
export * from './species-at-temperature';
export type * from './species-data';
export * from './species-notation';
export { shomateRangeAt } from './shomate';
export type { TemperatureRange, ThermoKernel } from './thermo-kernel';
export * from './uncertain-value';
export * from './units';
