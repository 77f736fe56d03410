import {
  checkEntropyPositive,
  checkFitReproducesReference,
  checkGibbsConsistency,
  checkHeatCapacityPositive,
  checkJointContinuity,
  checkPhaseEntropyOrder,
  checkPlausibleMagnitude,
  checkReferenceStateZero,
  checkSourceAgreement,
  checkStandardPressure,
  worstStatus,
  type CheckResult,
} from './consistency-checks';
import type { HeatCapacityFunction } from './heat-capacity';
import { expectWithin } from './testing/expect-within';
import { CODATA_1989, JANAF, kJ, NBS_1982, TM4513, WEBBOOK_SHOMATE } from './testing/published-values';

function expectStatus(result: CheckResult, status: CheckResult['status']): void {
  expect(result.status).withContext(result.message).toBe(status);
  expect(result.message.length).toBeGreaterThan(20);
}

describe('consistency checks', () => {
  describe('element in its reference state: ΔfH° = ΔfG° = 0', () => {
    it('passes N2(g) (JANAF: 0, 0)', () => {
      expectStatus(checkReferenceStateZero({ label: 'N2(g)', formationEnthalpy: 0, formationGibbsEnergy: 0 }), 'pass');
    });
    it('fails graphite given the values of C(g) (CODATA ΔfH°(C, g) = 716.68 kJ/mol: a phase mix-up)', () => {
      const r = checkReferenceStateZero({ label: 'C(cr, graphite)', formationEnthalpy: kJ(716.68) });
      expectStatus(r, 'failure');
      expect(r.message).toContain('716.680 kJ/mol');
    });
  });

  describe('S° > 0', () => {
    it('passes CODATA S°(H2O, l) = 69.95', () => expectStatus(checkEntropyPositive({ label: 'H2O(l)', entropy: 69.95 }), 'pass'));
    it('fails the same value with its sign flipped', () => expectStatus(checkEntropyPositive({ label: 'H2O(l)', entropy: -69.95 }), 'failure'));
  });

  describe('S°(g) > S°(l) > S°(cr) at one T', () => {
    it('passes water at 298.15 K (CODATA: g 188.835, l 69.95) and methanol (NBS: g 239.81, l 126.8)', () => {
      expectStatus(checkPhaseEntropyOrder({ label: 'H2O', temperature: 298.15, gas: 188.835, liquid: 69.95 }), 'pass');
      expectStatus(checkPhaseEntropyOrder({ label: 'CH3OH', temperature: 298.15, gas: 239.81, liquid: 126.8 }), 'pass');
    });
    it('fails when the gas and liquid values are swapped', () => {
      expectStatus(checkPhaseEntropyOrder({ label: 'H2O', temperature: 298.15, gas: 69.95, liquid: 188.835 }), 'failure');
    });
  });

  describe('Cp° > 0, and ≥ 5/2·R for an ideal gas', () => {
    it('passes TM-4513 N2 and monatomic H (exactly 5/2·R) over 200–6000 K', () => {
      expectStatus(checkHeatCapacityPositive({ label: 'N2(g)', heatCapacity: TM4513.N2, idealGas: true }), 'pass');
      expectStatus(checkHeatCapacityPositive({ label: 'H(g)', heatCapacity: TM4513.H, idealGas: true }), 'pass');
    });
    it('fails NBS Cp°(CO2, g) = 37.11 J/(mol·K) entered in cal/(mol·K) as 8.87 (below 5/2·R)', () => {
      const slip: HeatCapacityFunction = { kind: 'constant', cp: NBS_1982['CO2(g)'].cp / 4.184, tMin: 298.15, tMax: 1000 };
      const r = checkHeatCapacityPositive({ label: 'CO2(g)', heatCapacity: slip, idealGas: true, entropy: 213.74 });
      expectStatus(r, 'failure');
      expectWithin(r.numbers['minimumCp']!, 8.869, 0.001, 'min Cp');
    });
  });

  describe('a fit reproduces the species\' own 298.15 K ΔfH° and S°', () => {
    it('passes TM-4513 H2O against CODATA 1989 (−241.826 ± 0.040 kJ/mol, 188.835 ± 0.010)', () => {
      const r = checkFitReproducesReference({
        label: 'H2O(g)', heatCapacity: TM4513.H2O,
        formationEnthalpy: { value: kJ(CODATA_1989['H2O(g)'].dfH[0]), uncertainty: kJ(CODATA_1989['H2O(g)'].dfH[1]) },
        entropy: { value: CODATA_1989['H2O(g)'].s[0], uncertainty: CODATA_1989['H2O(g)'].s[1] },
      });
      expectStatus(r, 'pass');
    });
    it('passes TM-4513 NH3 against CODATA 1989 (−45.94 ± 0.35, 192.77 ± 0.05)', () => {
      expectStatus(checkFitReproducesReference({
        label: 'NH3(g)', heatCapacity: TM4513.NH3,
        formationEnthalpy: { value: kJ(-45.94), uncertainty: kJ(0.35) }, entropy: { value: 192.77, uncertainty: 0.05 },
      }), 'pass');
    });
    it('warns for TM-4513 CO against JANAF printed without uncertainty (fit 2.4 J/mol below −110.527 kJ/mol)', () => {
      const r = checkFitReproducesReference({
        label: 'CO(g)', heatCapacity: TM4513.CO,
        formationEnthalpy: { value: kJ(JANAF['CO'][298.15].dfH), uncertainty: 0 }, entropy: { value: JANAF['CO'][298.15].s, uncertainty: 0 },
      });
      expectStatus(r, 'warning');
      expectWithin(r.numbers['enthalpyDifference']!, -2.37, 0.01, 'ΔH / J');
    });
    it('fails TM-4513 CH4 against JANAF CH4 (the fit is built on a ΔfH° 0.27 kJ/mol higher)', () => {
      // JANAF ΔfH°(CH4, g) = −74.873 kJ/mol, S° = 186.251; the TM-4513 set gives −74.600
      const r = checkFitReproducesReference({
        label: 'CH4(g)', heatCapacity: TM4513.CH4,
        formationEnthalpy: { value: kJ(JANAF['CH4'][298.15].dfH), uncertainty: 0 }, entropy: { value: JANAF['CH4'][298.15].s, uncertainty: 0 },
      });
      expectStatus(r, 'failure');
      expectWithin(r.numbers['enthalpyDifference']! / 1000, 0.273, 0.001, 'ΔH / kJ');
    });
    it('checks the Shomate H constant and S against the species (WebBook N2 vs JANAF)', () => {
      expectStatus(checkFitReproducesReference({
        label: 'N2(g)', heatCapacity: WEBBOOK_SHOMATE.N2, formationEnthalpy: { value: 0, uncertainty: 0 }, entropy: { value: 191.609, uncertainty: 0.004 },
      }), 'pass');
    });
  });

  describe('continuity of Cp, H and S at range joints', () => {
    it('passes TM-4513 N2 and H2O at 1000 K and the WebBook Shomate N2 and H2O joints', () => {
      for (const [label, fn] of [['N2', TM4513.N2], ['H2O', TM4513.H2O], ['N2 Shomate', WEBBOOK_SHOMATE.N2], ['H2O Shomate', WEBBOOK_SHOMATE.H2O]] as const) {
        expectStatus(checkJointContinuity({ label, heatCapacity: fn }), 'pass');
      }
    });
    it('fails a set assembled from the N2 low range and the O2 high range (a pasted wrong range)', () => {
      const mixed: HeatCapacityFunction = { kind: 'nasa7', ranges: [TM4513.N2.ranges[0], TM4513.O2.ranges[1]] };
      const r = checkJointContinuity({ label: 'N2(g)', heatCapacity: mixed });
      expectStatus(r, 'failure');
      expect(r.message).toContain('at 1000 K');
    });
  });

  describe('stored ΔfG° agrees with ΔfH° − T·ΔfS°', () => {
    // NBS 1982 values; element entropies C(cr, graphite) 5.74 (CODATA 1989), H2 130.684,
    // O2 205.138 (NBS 1982).
    it('passes NBS CH4(g): −74.81 + 298.15 × 0.080844 = −50.706 vs printed −50.72 (14 J/mol)', () => {
      const r = checkGibbsConsistency({
        label: 'CH4(g)', formationEnthalpy: kJ(-74.81), formationGibbsEnergy: kJ(-50.72), entropy: 186.264,
        elementEntropies: [{ n: 1, entropy: 5.74 }, { n: 2, entropy: 130.684 }],
      });
      expectStatus(r, 'pass');
      expectWithin(r.numbers['difference']!, -13.6, 0.5, 'difference / J');
    });
    it('warns for NBS C2H5OH(l), whose printed values are 71 J/mol apart', () => {
      const r = checkGibbsConsistency({
        label: 'C2H5OH(l)', formationEnthalpy: kJ(-277.69), formationGibbsEnergy: kJ(-174.78), entropy: 160.7,
        elementEntropies: [{ n: 2, entropy: 5.74 }, { n: 3, entropy: 130.684 }, { n: 0.5, entropy: 205.138 }],
      });
      expectStatus(r, 'warning');
      expectWithin(r.numbers['difference']!, -71, 1, 'difference / J');
    });
    it('fails a 1000 K ΔfG° stored as the 298.15 K value (JANAF CO: −200.275 vs −137.163 kJ/mol)', () => {
      expectStatus(checkGibbsConsistency({
        label: 'CO(g)', formationEnthalpy: kJ(-110.527), formationGibbsEnergy: kJ(-200.275), entropy: 197.653,
        elementEntropies: [{ n: 1, entropy: 5.74 }, { n: 0.5, entropy: 205.147 }],
      }), 'failure');
    });
  });

  describe('agreement with other sources (z-score)', () => {
    it('passes CODATA ΔfH°(CO2) −393.51 ± 0.13 against NBS −393.509 (z ≈ 0.01)', () => {
      const r = checkSourceAgreement({ quantity: 'ΔfH°(CO2, g)', value: { value: -393.51, uncertainty: 0.13 }, other: { value: -393.509, uncertainty: 0 }, otherSource: 'NBS 1982' });
      expectStatus(r, 'pass');
      expectWithin(r.numbers['z']!, 0.0077, 0.0001, 'z');
    });
    it('warns for S°(O2): CODATA 205.152 ± 0.005 against NBS 205.138 (z = 2.8)', () => {
      const r = checkSourceAgreement({ quantity: 'S°(O2, g)', value: { value: 205.152, uncertainty: 0.005 }, other: { value: 205.138, uncertainty: 0 }, otherSource: 'NBS 1982' });
      expectStatus(r, 'warning');
      expectWithin(r.numbers['z']!, 2.8, 0.001, 'z');
    });
    it('fails for S°(NH3): CODATA 192.77 ± 0.05 against NBS 192.45 (z = 6.4)', () => {
      const r = checkSourceAgreement({ quantity: 'S°(NH3, g)', value: { value: 192.77, uncertainty: 0.05 }, other: { value: 192.45, uncertainty: 0 }, otherSource: 'NBS 1982' });
      expectStatus(r, 'failure');
      expectWithin(r.numbers['z']!, 6.4, 0.001, 'z');
    });
  });

  describe('plausible magnitude (unit slips)', () => {
    it('passes CODATA ΔfH°(CO2) in J/mol and warns when −393.51 kJ/mol was typed as J/mol', () => {
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'formationEnthalpy', value: -393510 }), 'pass');
      const r = checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'formationEnthalpy', value: -393.51 });
      expectStatus(r, 'warning');
      expect(r.message).toMatch(/kJ\/mol value entered as J\/mol/);
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'formationEnthalpy', value: -393510 * 1000 }), 'warning');
    });
    it('fails S°(CO2) = 213.785 × 4.184 against the CODATA value, naming the calorie slip', () => {
      const r = checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'entropy', value: 213.785 * 4.184, phase: 'g', atoms: 3, reference: 213.785, referenceSource: 'CODATA 1989' });
      expectStatus(r, 'failure');
      expect(r.message).toMatch(/calories entered as joules \(×4\.184\)/);
    });
    it('warns for the same slip without a reference, from the per-atom bound for a gas', () => {
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'entropy', value: 213.785 * 4.184, phase: 'g', atoms: 3 }), 'warning');
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'entropy', value: 213.785, phase: 'g', atoms: 3 }), 'pass');
    });
    it('warns for S°(CO2, g) in cal/(mol·K) (51.10) and for a kJ value ×1000 against its reference', () => {
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'entropy', value: 213.785 / 4.184, phase: 'g' }), 'warning');
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'formationEnthalpy', value: -393510000, reference: -393510 }), 'failure');
    });
    it('checks Cp° of a gas (NBS CO2 37.11 passes; 8.87 in cal warns) and of a condensed phase', () => {
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'heatCapacity', value: 37.11, phase: 'g', atoms: 3 }), 'pass');
      expectStatus(checkPlausibleMagnitude({ label: 'CO2(g)', kind: 'heatCapacity', value: 37.11 / 4.184, phase: 'g', atoms: 3 }), 'warning');
      expectStatus(checkPlausibleMagnitude({ label: 'H2O(l)', kind: 'heatCapacity', value: 75.291, phase: 'l', atoms: 3 }), 'pass');
      expectStatus(checkPlausibleMagnitude({ label: 'H2O(l)', kind: 'heatCapacity', value: 75.291 * 4.184, phase: 'l', atoms: 3 }), 'warning');
    });
  });

  describe('standard pressure stated; 1 atm gas data converted', () => {
    it('passes 1 bar, warns for a gas at 1 atm with the converted S°, passes a liquid at 1 atm', () => {
      expectStatus(checkStandardPressure({ label: 'N2(g)', pressure: 1e5, phase: 'g', entropy: 191.61 }), 'pass');
      // NBS 1982 N2(g) is at 1 bar; the same gas given at 1 atm would be 191.50, → 191.61 at 1 bar
      const r = checkStandardPressure({ label: 'N2(g)', pressure: 101325, phase: 'g', entropy: 191.5 });
      expectStatus(r, 'warning');
      expectWithin(r.numbers['convertedEntropy']!, 191.61, 0.0006, 'S°(1 bar)');
      expectStatus(checkStandardPressure({ label: 'H2O(l)', pressure: 101325, phase: 'l' }), 'pass');
    });
    it('fails when no pressure, or an unknown pressure, is stated', () => {
      expectStatus(checkStandardPressure({ label: 'N2(g)', pressure: null, phase: 'g' }), 'failure');
      expectStatus(checkStandardPressure({ label: 'N2(g)', pressure: 2e5, phase: 'g' }), 'failure');
    });
  });

  it('summarises several results by the worst status', () => {
    const pass = checkEntropyPositive({ label: 'H2O(l)', entropy: 69.95 });
    const fail = checkEntropyPositive({ label: 'H2O(l)', entropy: -69.95 });
    expect(worstStatus([pass, fail])).toBe('failure');
    expect(worstStatus([pass])).toBe('pass');
    expect(worstStatus([])).toBe('pass');
  });
});
