import fc from 'fast-check';
import { P_ATM, P_STD } from './constants';
import { ThermoInputError } from './errors';
import { expectWithin } from './testing/expect-within';
import { expectProperty } from './testing/expect-property';
import {
  ATM_TO_BAR_GAS_ENTROPY_CORRECTION,
  celsiusToKelvin,
  convertEnergy,
  fromJoules,
  gasEntropyAtmToBar,
  gasEntropyBarToAtm,
  gasEntropyPressureCorrection,
  kelvinToCelsius,
  toJoules,
  type EnergyUnit,
} from './units';

describe('unit conversions', () => {
  it('1 cal (thermochemical) = 4.184 J exactly; 1 cal(IT) = 4.1868 J exactly', () => {
    // Definitions (NIST SP 811, appendix B): thermochemical calorie 4.184 J, IT calorie 4.1868 J
    expect(toJoules(1, 'cal')).toBe(4.184);
    expect(toJoules(1, 'kcal')).toBe(4184);
    expect(toJoules(1, 'cal_IT')).toBe(4.1868);
    expect(toJoules(1, 'kcal_IT')).toBe(4186.8);
    expect(convertEnergy(1, 'kJ', 'J')).toBe(1000);
  });

  it('converts a published value: ΔfH°(CO2, g) = −393.51 kJ/mol = −94.051 kcal/mol', () => {
    // CODATA 1989: −393.51 kJ/mol; ÷ 4.184 = −94.051 kcal/mol (thermochemical)
    expectWithin(convertEnergy(-393.51, 'kJ', 'kcal'), -94.051, 0.0005, 'kcal');
    expectWithin(fromJoules(-393510, 'kJ'), -393.51, 1e-9, 'kJ');
    expect(convertEnergy(-393.51, 'kcal', 'kcal_IT')).not.toBe(-393.51);
  });

  it('round-trips every pair of energy units (property)', () => {
    const units: EnergyUnit[] = ['J', 'kJ', 'cal', 'kcal', 'cal_IT', 'kcal_IT'];
    expectProperty(
      fc.property(fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.constantFrom(...units), fc.constantFrom(...units), (x, a, b) => {
        const back = convertEnergy(convertEnergy(x, a, b), b, a);
        return Math.abs(back - x) <= 1e-12 * Math.max(1, Math.abs(x));
      }),
      { numRuns: 1000 },
    );
  });

  it('converts K and °C (0 °C = 273.15 K exactly) and round-trips (property)', () => {
    expect(celsiusToKelvin(25)).toBe(298.15);
    expect(kelvinToCelsius(273.15)).toBe(0);
    expectProperty(
      fc.property(fc.double({ min: 0, max: 1e5, noNaN: true }), (t) => Math.abs(celsiusToKelvin(kelvinToCelsius(t)) - t) <= 1e-9 * Math.max(1, t)),
      { numRuns: 500 },
    );
  });

  it('refuses temperatures below absolute zero', () => {
    expect(() => celsiusToKelvin(-300)).toThrowError(ThermoInputError);
    expect(() => kelvinToCelsius(-1)).toThrowError(ThermoInputError);
  });

  it('1 atm → 1 bar for an ideal gas: S° rises by R·ln(1.01325) = 0.10944 J/(mol·K)', () => {
    // published-values.md (IUPAC 1982 change of standard pressure): 0.10944 J/(mol·K)
    expectWithin(ATM_TO_BAR_GAS_ENTROPY_CORRECTION, 0.10944, 5e-6, 'R ln 1.01325');
    expectWithin(gasEntropyPressureCorrection(P_ATM, P_STD), 0.10944, 5e-6, 'correction');
  });

  it('converts the NBS 1982 N2(g) S° = 191.61 (1 bar) to 191.50 at 1 atm and back', () => {
    // NBS 1982 S°(N2, g) = 191.61 J/(mol·K) at 1 bar; at 1 atm 191.61 − 0.109 = 191.50
    expectWithin(gasEntropyBarToAtm(191.61), 191.50, 0.005, 'at 1 atm');
    expectWithin(gasEntropyAtmToBar(gasEntropyBarToAtm(191.61)), 191.61, 1e-12, 'round trip');
  });

  it('refuses non-positive pressures', () => {
    expect(() => gasEntropyPressureCorrection(0, P_STD)).toThrowError(ThermoInputError);
  });
});
