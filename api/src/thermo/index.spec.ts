import * as thermo from './index';
import { expectWithin } from './testing/expect-within';
import { JANAF, kJ, TM4513 } from './testing/published-values';

describe('thermo public API', () => {
  it('takes an equation from text to JANAF ΔrG°(1000 K) of H2(g) + 1/2 O2(g) -> H2O(g) = −192.590 kJ/mol (±0.03)', () => {
    // NIST-JANAF 4th ed. (Chase 1998): ΔfG°(H2O, g, 1000 K) = −192.590 kJ/mol, with the
    // TM-4513 functions and the JANAF 298.15 K values; tolerance as in species-at-temperature.spec
    const reaction = thermo.parseReaction('H2(g) + 1/2 O2(g) -> H2O(g)');
    expect(thermo.checkBalance(reaction).balanced).toBeTrue();
    const data: Record<string, thermo.SpeciesThermoData> = {
      'H2(g)': { label: 'H2(g)', elements: { H: 2 }, heatCapacity: TM4513.H2, formationEnthalpy: thermo.exact(0), entropy: thermo.exact(JANAF['H2'][298.15].s) },
      'O2(g)': { label: 'O2(g)', elements: { O: 2 }, heatCapacity: TM4513.O2, formationEnthalpy: thermo.exact(0), entropy: thermo.exact(JANAF['O2'][298.15].s) },
      'H2O(g)': { label: 'H2O(g)', elements: { H: 2, O: 1 }, heatCapacity: TM4513.H2O, formationEnthalpy: thermo.exact(kJ(-241.826)), entropy: thermo.exact(188.834) },
    };
    const participants = thermo.stoichiometricNumbers(reaction).map((e) => ({ nu: e.nu, data: data[e.label] }));
    const r = thermo.reactionAt(participants, 1000);
    expectWithin(r.deltaG.value / 1000, JANAF['H2O'][1000].dfG, 0.03, 'ΔrG° / kJ');
    expect(r.favouredBy).toBe('enthalpy');
  });

  it('exports every module the issue asks for', () => {
    const names = ['parseFormula', 'hillFormula', 'molarMass', 'parseSpecies', 'parseReaction', 'balanceReaction', 'normaliseEquation',
      'evaluateHeatCapacity', 'speciesAtTemperature', 'compileReaction', 'crossoverTemperature', 'deriveFormationEnthalpy',
      'convertEnergy', 'gasEntropyAtmToBar', 'fitNasa7TwoRange', 'checkSourceAgreement', 'adiabaticTemperatureRise',
      'standardFromExpanded', 'R', 'T_REF', 'P_STD', 'P_ATM', 'ADIABATIC_RISE_CAUTION'];
    const api = thermo as unknown as Record<string, unknown>;
    for (const name of names) expect(api[name]).withContext(name).toBeDefined();
  });
});
