import { ADIABATIC_RISE_CAUTION, adiabaticTemperatureRise } from './adiabatic-rise';
import { ThermoInputError } from './errors';
import { expectWithin } from './testing/expect-within';
import { NBS_1982 } from './testing/published-values';

describe('adiabaticTemperatureRise', () => {
  it('1 mol of methane burnt into 10 kg of water heats it by 21.3 K (screening)', () => {
    // NBS 1982: ΔcH°(CH4) = −890.36 kJ/mol (Hess sum of the printed ΔfH°); c_p of water from
    // NBS Cp°(H2O, l) = 75.291 J/(mol·K) (from memory; JANAF 75.351) ÷ 18.015 g/mol (IUPAC 2021)
    // = 4179.4 J/(kg·K). ΔT = 890 359 J / (10 kg × 4179.4 J/(kg·K)) = 21.30 K.
    const cp = NBS_1982['H2O(l)'].cp / 0.018015;
    const r = adiabaticTemperatureRise({ reactionEnthalpy: -890359, extent: 1, mass: 10, specificHeatCapacity: cp });
    expectWithin(r.deltaT, 21.3, 0.005, 'ΔT');
    expect(r.caution).toBe(ADIABATIC_RISE_CAUTION);
  });

  it('always carries the caution that it is a screening estimate, deferring to a process-safety review', () => {
    expect(ADIABATIC_RISE_CAUTION).toMatch(/screening estimate only, not for design/i);
    expect(ADIABATIC_RISE_CAUTION).toMatch(/qualified process-safety review/);
    expect(ADIABATIC_RISE_CAUTION).toMatch(/local codes/);
  });

  it('gives a fall for an endothermic reaction and refuses a non-positive mass or heat capacity', () => {
    expect(adiabaticTemperatureRise({ reactionEnthalpy: 890359, extent: 1, mass: 10, specificHeatCapacity: 4179.4 }).deltaT).toBeLessThan(0);
    expect(() => adiabaticTemperatureRise({ reactionEnthalpy: -1, extent: 1, mass: 0, specificHeatCapacity: 4179.4 })).toThrowError(ThermoInputError);
    expect(() => adiabaticTemperatureRise({ reactionEnthalpy: -1, extent: 1, mass: 1, specificHeatCapacity: -1 })).toThrowError(ThermoInputError);
    expect(() => adiabaticTemperatureRise({ reactionEnthalpy: Number.NaN, extent: 1, mass: 1, specificHeatCapacity: 1 })).toThrowError(ThermoInputError);
  });
});
