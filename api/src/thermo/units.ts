import { CELSIUS_ZERO, P_ATM, P_STD, R } from './constants';
import { ThermoInputError } from './errors';

/**
 * Energy units Kelvindex accepts. The thermochemical calorie (`cal`, 4.184 J exactly) is the
 * one of the thermochemical tables; the International Table calorie (`cal_IT`, 4.1868 J
 * exactly) is a different unit and is kept distinct so a value is never silently converted
 * with the wrong factor. The same factors apply to molar quantities (kJ/mol, cal/(mol·K)…).
 */
export type EnergyUnit = 'J' | 'kJ' | 'cal' | 'kcal' | 'cal_IT' | 'kcal_IT';

/** Joules per unit (all exact by definition). */
export const JOULES_PER: Readonly<Record<EnergyUnit, number>> = {
  J: 1,
  kJ: 1000,
  cal: 4.184,
  kcal: 4184,
  cal_IT: 4.1868,
  kcal_IT: 4186.8,
};

/** Converts an energy (or molar energy, or molar entropy) from one unit to another. */
export function convertEnergy(value: number, from: EnergyUnit, to: EnergyUnit): number {
  if (from === to) return value;
  return (value * JOULES_PER[from]) / JOULES_PER[to];
}

/** Value in J (J/mol, J/(mol·K)) from the given unit. */
export function toJoules(value: number, from: EnergyUnit): number {
  return value * JOULES_PER[from];
}

/** Value in the given unit from J (J/mol, J/(mol·K)). */
export function fromJoules(value: number, to: EnergyUnit): number {
  return value / JOULES_PER[to];
}

/** T / K from t / °C. Refuses temperatures below absolute zero. */
export function celsiusToKelvin(celsius: number): number {
  const kelvin = celsius + CELSIUS_ZERO;
  if (!(kelvin >= 0)) throw new ThermoInputError('temperature', `${celsius} °C is below absolute zero`);
  return kelvin;
}

/** t / °C from T / K. Refuses negative kelvin. */
export function kelvinToCelsius(kelvin: number): number {
  if (!(kelvin >= 0)) throw new ThermoInputError('temperature', `${kelvin} K is below absolute zero`);
  return kelvin - CELSIUS_ZERO;
}

/**
 * Ideal-gas entropy change when the standard pressure changes from `fromPa` to `toPa`:
 * S°(to) − S°(from) = R·ln(from/to), in J/(mol·K). Enthalpy of an ideal gas does not change.
 */
export function gasEntropyPressureCorrection(fromPa: number, toPa: number): number {
  if (!(fromPa > 0) || !(toPa > 0)) {
    throw new ThermoInputError('pressure', `pressures must be positive, got ${fromPa} Pa and ${toPa} Pa`);
  }
  return R * Math.log(fromPa / toPa);
}

/** S°(1 bar) − S°(1 atm) for an ideal gas = R·ln(1.01325) ≈ 0.10944 J/(mol·K). */
export const ATM_TO_BAR_GAS_ENTROPY_CORRECTION = gasEntropyPressureCorrection(P_ATM, P_STD);

/** Ideal-gas S° at 1 bar from S° at 1 atm, J/(mol·K). */
export function gasEntropyAtmToBar(entropyAtAtm: number): number {
  return entropyAtAtm + ATM_TO_BAR_GAS_ENTROPY_CORRECTION;
}

/** Ideal-gas S° at 1 atm from S° at 1 bar, J/(mol·K). */
export function gasEntropyBarToAtm(entropyAtBar: number): number {
  return entropyAtBar - ATM_TO_BAR_GAS_ENTROPY_CORRECTION;
}
