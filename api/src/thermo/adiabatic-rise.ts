import { ThermoInputError } from './errors';

/** Must be shown wherever an adiabatic temperature rise is shown. */
export const ADIABATIC_RISE_CAUTION =
  'Screening estimate only, not for design: it assumes no heat loss, complete conversion, ' +
  'constant heat capacity and no phase change, side reaction or gas evolution. Defer to a ' +
  'qualified process-safety review and to local codes before acting on it.';

/** Inputs in SI units. */
export interface AdiabaticRiseInput {
  /** ΔrH° / (J mol⁻¹) of the reaction as written (negative when exothermic) */
  readonly reactionEnthalpy: number;
  /** extent of reaction n / mol (moles of the reaction as written) */
  readonly extent: number;
  /** mass of the reacting mixture m / kg */
  readonly mass: number;
  /** specific heat capacity of the mixture c_p / (J kg⁻¹ K⁻¹) */
  readonly specificHeatCapacity: number;
}

/**
 * Adiabatic temperature rise for screening: ΔT_ad = −ΔrH·n/(m·c_p) / K (common practice in
 * reaction-hazard screening). Always returned with `ADIABATIC_RISE_CAUTION`.
 * @throws ThermoInputError for a non-positive mass or heat capacity, or non-finite inputs
 */
export function adiabaticTemperatureRise(input: AdiabaticRiseInput): { deltaT: number; caution: string } {
  const { reactionEnthalpy, extent, mass, specificHeatCapacity } = input;
  if (!Number.isFinite(reactionEnthalpy)) throw new ThermoInputError('reactionEnthalpy', 'must be a finite number of J/mol');
  if (!(Number.isFinite(extent) && extent >= 0)) throw new ThermoInputError('extent', 'must be a non-negative number of mol');
  if (!(Number.isFinite(mass) && mass > 0)) throw new ThermoInputError('mass', 'must be a positive number of kg');
  if (!(Number.isFinite(specificHeatCapacity) && specificHeatCapacity > 0)) {
    throw new ThermoInputError('specificHeatCapacity', 'must be a positive number of J/(kg·K)');
  }
  return { deltaT: (-reactionEnthalpy * extent) / (mass * specificHeatCapacity), caution: ADIABATIC_RISE_CAUTION };
}
