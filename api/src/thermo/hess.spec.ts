import { ThermoInputError } from './errors';
import { deriveFormationEnthalpy } from './hess';
import { expectWithin } from './testing/expect-within';
import { CODATA_1989, kJ, NBS_1982 } from './testing/published-values';

describe('deriveFormationEnthalpy (Hess\'s law in reverse)', () => {
  it('recovers NBS 1982 ΔfH°(CH4, g) = −74.81 kJ/mol from the combustion enthalpy −890.36 kJ/mol', () => {
    // NBS 1982: ΔcH° = ΔfH°(CO2) + 2ΔfH°(H2O, l) − ΔfH°(CH4) = −890.36 kJ/mol (derived from the
    // printed −393.509, −285.830, −74.81); inverting it must give back −74.81.
    const r = deriveFormationEnthalpy({ value: kJ(-890.359), uncertainty: 0 }, [
      { label: 'CH4(g)', nu: -1, formationEnthalpy: null },
      { label: 'O2(g)', nu: -2, formationEnthalpy: { value: 0, uncertainty: 0 } },
      { label: 'CO2(g)', nu: 1, formationEnthalpy: { value: kJ(NBS_1982['CO2(g)'].dfH), uncertainty: 0 } },
      { label: 'H2O(l)', nu: 2, formationEnthalpy: { value: kJ(NBS_1982['H2O(l)'].dfH), uncertainty: 0 } },
    ]);
    expectWithin(r.formationEnthalpy.value / 1000, -74.81, 0.005, 'ΔfH°(CH4)');
  });

  it('derives CODATA ΔfH°(CO, g) from CO + ½O2 → CO2 with the GUM uncertainty and its budget', () => {
    // CODATA 1989: ΔfH°(CO2) = −393.51 ± 0.13, ΔfH°(CO) = −110.53 ± 0.17 kJ/mol, so the
    // reaction enthalpy is −282.98 ± 0.214 kJ/mol; inverting gives −110.53 with
    // u = sqrt(0.214² + 0.13²) = 0.250 kJ/mol (the inputs are then correlated in truth; GUM's
    // uncorrelated formula, as specified, gives this larger value).
    const uReaction = Math.hypot(0.13, 0.17);
    const r = deriveFormationEnthalpy({ value: kJ(-282.98), uncertainty: kJ(uReaction) }, [
      { label: 'CO(g)', nu: -1, formationEnthalpy: null },
      { label: 'O2(g)', nu: -0.5, formationEnthalpy: { value: 0, uncertainty: 0 } },
      { label: 'CO2(g)', nu: 1, formationEnthalpy: { value: kJ(CODATA_1989['CO2(g)'].dfH[0]), uncertainty: kJ(CODATA_1989['CO2(g)'].dfH[1]) } },
    ]);
    expectWithin(r.formationEnthalpy.value / 1000, -110.53, 1e-9, 'ΔfH°(CO)');
    expectWithin(r.formationEnthalpy.uncertainty / 1000, Math.hypot(uReaction, 0.13), 1e-12, 'u');
    expect(r.budget[0].source).toBe('measured ΔrH°');
    expect(r.budget.map((b) => b.source)).toContain('CO2(g)');
  });

  it('divides by the stoichiometric number of the unknown (2 H2 + O2 → 2 H2O(l), CODATA)', () => {
    // CODATA 1989: ΔfH°(H2O, l) = −285.830 ± 0.040 kJ/mol; ΔrH° of 2 H2 + O2 → 2 H2O is twice that
    const r = deriveFormationEnthalpy({ value: kJ(-571.66), uncertainty: kJ(0.08) }, [
      { label: 'H2(g)', nu: -2, formationEnthalpy: { value: 0, uncertainty: 0 } },
      { label: 'O2(g)', nu: -1, formationEnthalpy: { value: 0, uncertainty: 0 } },
      { label: 'H2O(l)', nu: 2, formationEnthalpy: null },
    ]);
    expectWithin(r.formationEnthalpy.value / 1000, -285.83, 1e-9, 'ΔfH°');
    expectWithin(r.formationEnthalpy.uncertainty / 1000, 0.04, 1e-12, 'u');
  });

  it('needs exactly one unknown with a non-zero ν', () => {
    const known = { value: 0, uncertainty: 0 };
    expect(() => deriveFormationEnthalpy(known, [{ label: 'A', nu: 1, formationEnthalpy: known }])).toThrowError(ThermoInputError);
    expect(() => deriveFormationEnthalpy(known, [{ label: 'A', nu: 1, formationEnthalpy: null }, { label: 'B', nu: 1, formationEnthalpy: null }]))
      .toThrowError(ThermoInputError);
    expect(() => deriveFormationEnthalpy(known, [{ label: 'A', nu: 0, formationEnthalpy: null }])).toThrowError(ThermoInputError);
  });
});
