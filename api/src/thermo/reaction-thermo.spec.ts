import fc from 'fast-check';
import { LN10, R } from './constants';
import { OutOfRangeError } from './errors';
import type { HeatCapacityFunction } from './heat-capacity';
import { compileReaction, crossoverTemperature, favouredBy, reactionAt, reactionProfile, type ReactionParticipant } from './reaction-thermo';
import type { SpeciesThermoData } from './species-data';
import { expectWithin } from './testing/expect-within';
import { CODATA_1989, JANAF, kJ, NBS_1982, TM4513 } from './testing/published-values';
import { expectProperty } from './testing/expect-property';

/** A participant with a constant Cp over 298.15–1000 K (only 298.15 K values are checked). */
function species(label: string, dfH: number, uH: number, s: number, uS: number, cp = 0): SpeciesThermoData {
  const heatCapacity: HeatCapacityFunction = { kind: 'constant', cp, tMin: 298.15, tMax: 1000 };
  return { label, elements: {}, formationEnthalpy: { value: kJ(dfH), uncertainty: kJ(uH) }, entropy: { value: s, uncertainty: uS }, heatCapacity };
}
const nbs = (key: keyof typeof NBS_1982) => species(key, NBS_1982[key].dfH, 0, NBS_1982[key].s, 0);
const codata = (key: keyof typeof CODATA_1989) =>
  species(key, CODATA_1989[key].dfH[0], CODATA_1989[key].dfH[1], CODATA_1989[key].s[0], CODATA_1989[key].s[1]);
const p = (nu: number, data: SpeciesThermoData): ReactionParticipant => ({ nu, data });

describe('reaction thermochemistry', () => {
  describe('NBS 1982 reactions at 298.15 K, to the tables\' rounding', () => {
    // The NBS Tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982); ΔrX = Σν·X.
    // Expected values are the Hess sums of the printed values, rounded as printed
    // (0.01 kJ/mol, 0.01 J/(mol·K)); ΔrG° is compared with Σν·ΔfG° printed, which the tables
    // reproduce only to ~0.03 kJ/mol (published-values.md).
    const cases: Array<{ name: string; participants: ReactionParticipant[]; dH: number; dS: number; dG: number; dGTolerance?: number }> = [
      {
        name: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)',
        participants: [p(-1, nbs('CH4(g)')), p(-2, nbs('O2(g)')), p(1, nbs('CO2(g)')), p(2, nbs('H2O(l)'))],
        dH: -890.36, dS: -242.98, dG: -394.359 - 2 * 237.129 + 50.72,
      },
      {
        name: 'H2(g) + 1/2 O2(g) -> H2O(l)',
        participants: [p(-1, nbs('H2(g)')), p(-0.5, nbs('O2(g)')), p(1, nbs('H2O(l)'))],
        dH: -285.83, dS: -163.34, dG: -237.129,
      },
      {
        name: 'CO(g) + 1/2 O2(g) -> CO2(g)',
        participants: [p(-1, nbs('CO(g)')), p(-0.5, nbs('O2(g)')), p(1, nbs('CO2(g)'))],
        dH: -282.98, dS: -86.50, dG: -394.359 + 137.168,
      },
      {
        name: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)',
        participants: [p(-1, nbs('C2H5OH(l)')), p(-3, nbs('O2(g)')), p(2, nbs('CO2(g)')), p(3, nbs('H2O(l)'))],
        // The NBS C2H5OH(l) entry is itself inconsistent by 0.07 kJ/mol (ΔfG° vs ΔfH° − TΔfS°;
        // see consistency-checks.spec), so ΔrG° agrees only to 0.08 kJ/mol here.
        dH: -1366.82, dS: -138.9, dG: 2 * -394.359 + 3 * -237.129 + 174.78, dGTolerance: 0.08,
      },
    ];
    for (const c of cases) {
      it(c.name, () => {
        const r = reactionAt(c.participants, 298.15);
        expectWithin(r.deltaH.value / 1000, c.dH, 0.005, 'ΔrH° / kJ');
        expectWithin(r.deltaS.value, c.dS, 0.005, 'ΔrS°');
        expectWithin(r.deltaG.value / 1000, c.dG, c.dGTolerance ?? 0.03, 'ΔrG° / kJ');
      });
    }

    it('N2(g) + 3 H2(g) -> 2 NH3(g): ΔrH° = −92.22 kJ/mol, ΔrS° = −198.76 J/(mol·K)', () => {
      // NBS 1982 via issue 3: ΔfH°(NH3, g) = −46.11 kJ/mol; S° NH3, H2, N2 = 192.45, 130.684, 191.61
      const r = reactionAt([p(-1, nbs('N2(g)')), p(-3, nbs('H2(g)')), p(2, species('NH3(g)', -46.11, 0, 192.45, 0))], 298.15);
      expectWithin(r.deltaH.value / 1000, -92.22, 0.005, 'ΔrH° / kJ');
      expectWithin(r.deltaS.value, -198.76, 0.005, 'ΔrS°');
      expect(r.favouredBy).toBe('enthalpy');
    });
  });

  describe('CODATA 1989 reactions at 298.15 K with propagated uncertainty', () => {
    // CODATA Key Values for Thermodynamics (Cox, Wagman & Medvedev, 1989); uncertainties as
    // printed, propagated uncorrelated (GUM, JCGM 100:2008): u = sqrt(Σν²u²).
    it('N2 + 3 H2 -> 2 NH3(g): ΔrH° = −91.88 ± 0.70 kJ/mol, ΔrS° = −198.11 ± 0.10 J/(mol·K)', () => {
      // differs from the NBS check above by 0.34 kJ/mol and 0.65 J/(mol·K): the tables differ
      const r = reactionAt([p(-1, codata('N2(g)')), p(-3, codata('H2(g)')), p(2, codata('NH3(g)'))], 298.15);
      expectWithin(r.deltaH.value / 1000, -91.88, 0.005, 'ΔrH° / kJ');
      expectWithin(r.deltaH.uncertainty / 1000, 0.7, 1e-9, 'u(ΔrH°) / kJ');
      expectWithin(r.deltaS.value, -198.109, 0.0005, 'ΔrS°');
      expectWithin(r.deltaS.uncertainty, Math.sqrt(4 * 0.05 ** 2 + 0.004 ** 2 + 9 * 0.003 ** 2), 1e-12, 'u(ΔrS°)');
    });

    it('H2 + 1/2 O2 -> H2O(l): ΔrH° = −285.830 ± 0.040 kJ/mol, ΔrS° = −163.306 J/(mol·K)', () => {
      const r = reactionAt([p(-1, codata('H2(g)')), p(-0.5, codata('O2(g)')), p(1, codata('H2O(l)'))], 298.15);
      expectWithin(r.deltaH.value / 1000, -285.83, 1e-9, 'ΔrH° / kJ');
      expectWithin(r.deltaH.uncertainty / 1000, 0.04, 1e-12, 'u(ΔrH°) / kJ');
      expectWithin(r.deltaS.value, -163.306, 0.0005, 'ΔrS°');
      expectWithin(r.deltaS.uncertainty, Math.sqrt(0.03 ** 2 + 0.003 ** 2 + 0.25 * 0.005 ** 2), 1e-12, 'u(ΔrS°)');
    });

    it('H2 + 1/2 O2 -> H2O(g): ΔrH° = −241.826 kJ/mol, ΔrS° = −44.421 J/(mol·K)', () => {
      const r = reactionAt([p(-1, codata('H2(g)')), p(-0.5, codata('O2(g)')), p(1, codata('H2O(g)'))], 298.15);
      expectWithin(r.deltaH.value / 1000, -241.826, 1e-9, 'ΔrH° / kJ');
      expectWithin(r.deltaS.value, -44.421, 0.0005, 'ΔrS°');
    });

    it('CO + 1/2 O2 -> CO2: ΔrH° = −282.98 ± 0.21 kJ/mol, ΔrS° = −86.451 J/(mol·K); u(ΔrG°), u(log10 K) follow', () => {
      const r = reactionAt([p(-1, codata('CO(g)')), p(-0.5, codata('O2(g)')), p(1, codata('CO2(g)'))], 298.15);
      expectWithin(r.deltaH.value / 1000, -282.98, 1e-9, 'ΔrH° / kJ');
      expectWithin(r.deltaH.uncertainty / 1000, Math.hypot(0.13, 0.17), 1e-12, 'u(ΔrH°) / kJ');
      expectWithin(r.deltaS.value, -86.451, 0.0005, 'ΔrS°');
      const uS = Math.sqrt(0.01 ** 2 + 0.004 ** 2 + 0.25 * 0.005 ** 2);
      expectWithin(r.deltaG.uncertainty, Math.hypot(r.deltaH.uncertainty, 298.15 * uS), 1e-9, 'u(ΔrG°)');
      expectWithin(r.log10K.uncertainty, r.deltaG.uncertainty / (R * 298.15 * LN10), 1e-12, 'u(log10 K)');
      expectWithin(r.k.uncertainty / r.k.value, LN10 * r.log10K.uncertainty, 1e-12, 'u(K)/K');
    });
  });

  it('reproduces JANAF ΔfG°(H2O, l) = −237.141 kJ/mol and log10 Kf = 41.545 from JANAF ΔfH° and S°', () => {
    // NIST-JANAF 4th ed. (Chase 1998): ΔfH°(H2O, l) = −285.830, S° = 69.950; S°(H2) = 130.680,
    // S°(O2) = 205.147; ΔfG° printed −237.141; log10 Kf = −ΔfG°/(RT ln 10) = 41.545 (derived)
    const janaf = (label: string, dfH: number, s: number) => species(label, dfH, 0, s, 0);
    const r = reactionAt([p(-1, janaf('H2', 0, 130.68)), p(-0.5, janaf('O2', 0, 205.147)), p(1, janaf('H2O(l)', -285.83, 69.95))], 298.15);
    expectWithin(r.deltaG.value / 1000, JANAF['H2O(l)'][298.15].dfG, 0.0005, 'ΔrG° / kJ');
    expectWithin(r.log10K.value, 41.545, 0.001, 'log10 K');
    expectWithin(Math.log10(r.k.value), r.log10K.value, 1e-9, 'K = 10^log10K');
  });

  describe('temperature dependence with TM-4513 functions', () => {
    const gas = (label: string, fn: HeatCapacityFunction, row: { dfH: number; s: number }): SpeciesThermoData => ({
      label, elements: {}, heatCapacity: fn, formationEnthalpy: { value: kJ(row.dfH), uncertainty: 0 }, entropy: { value: row.s, uncertainty: 0 },
    });
    const methaneCombustion = [
      p(-1, gas('CH4(g)', TM4513.CH4, JANAF['CH4'][298.15])),
      p(-2, gas('O2(g)', TM4513.O2, JANAF['O2'][298.15])),
      p(1, { ...gas('CO2(g)', TM4513.CO2, { dfH: -393.51, s: 213.785 }) }), // CODATA 1989
      p(2, gas('H2O(g)', TM4513.H2O, JANAF['H2O'][298.15])),
    ];
    const ammonia = [
      p(-1, gas('N2(g)', TM4513.N2, JANAF['N2'][298.15])),
      p(-3, gas('H2(g)', TM4513.H2, JANAF['H2'][298.15])),
      p(2, gas('NH3(g)', TM4513.NH3, JANAF['NH3'][298.15])),
    ];

    it('ΔrG° = ΔrH° − T·ΔrS° at every T (property)', () => {
      // Definition of the Gibbs energy
      const compiled = compileReaction(methaneCombustion);
      expectProperty(
        fc.property(fc.double({ min: 200, max: 6000, noNaN: true }), (t) => {
          const r = compiled.at(t);
          return Math.abs(r.deltaG.value - (r.deltaH.value - t * r.deltaS.value)) <= 1e-9 * Math.abs(r.deltaH.value);
        }),
        { numRuns: 300 },
      );
    });

    it('ΔrH°(T) − ΔrH°(298.15) = ∫ΔrCp dT (Kirchhoff; trapezoid on 2000 steps, property)', () => {
      const compiled = compileReaction(ammonia);
      expectProperty(
        fc.property(fc.double({ min: 300, max: 5000, noNaN: true }), (t) => {
          const steps = 2000;
          const temps = Array.from({ length: steps + 1 }, (_, i) => 298.15 + ((t - 298.15) * i) / steps);
          const prof = compiled.evaluate(temps);
          let integral = 0;
          for (let i = 1; i <= steps; i++) integral += 0.5 * (prof.deltaCp[i] + prof.deltaCp[i - 1]) * (temps[i] - temps[i - 1]);
          return Math.abs(prof.deltaH[steps] - prof.deltaH[0] - integral) < 0.05;
        }),
        { numRuns: 20 },
      );
    });

    it('a profile matches point-by-point evaluation and flags nothing inside the range', () => {
      const temps = [298.15, 500, 999, 1000, 1001, 2500, 6000];
      const prof = reactionProfile(methaneCombustion, temps);
      temps.forEach((t, i) => {
        const r = reactionAt(methaneCombustion, t);
        expect(prof.deltaG[i]).toBe(r.deltaG.value);
        expect(prof.log10K[i]).toBe(r.log10K.value);
        expect(prof.favouredBy[i]).toBe(r.favouredBy);
        expect(prof.extrapolated[i]).toBe(0);
      });
    });

    it('refuses temperatures outside a participant\'s range, naming it, unless asked', () => {
      // NASA TM-4513 sets are valid 200–6000 K
      expect(() => reactionAt(methaneCombustion, 150)).toThrowMatching(
        (e) => e instanceof OutOfRangeError && e.temperature === 150 && /CH4\(g\)/.test(e.message),
      );
      const r = reactionAt(methaneCombustion, 150, { extrapolate: true });
      expect(r.extrapolated).toBeTrue();
    });

    it('finds ΔrG° = 0 for ammonia synthesis between 400 and 500 K, where ΔrG°(T*) vanishes', () => {
      // First guess ΔrH°/ΔrS° from JANAF 298.15 K values: 91.796 kJ/mol / 198.101 J/(mol·K) =
      // 463.38 K; the fits' own S°(298.15) differ from JANAF by ≤ 0.005 J/(mol·K), hence ±0.05 K.
      const result = crossoverTemperature(ammonia);
      expect(result.found).toBeTrue();
      if (!result.found) return;
      expect(result.temperature).toBeGreaterThan(400);
      expect(result.temperature).toBeLessThan(500);
      expect(result.roots.length).toBe(1);
      expect(Math.abs(reactionAt(ammonia, result.temperature).deltaG.value)).toBeLessThan(1e-3);
      expectWithin(result.firstGuess!, (2 * 45898) / (191.609 + 3 * 130.68 - 2 * 192.774), 0.05, 'first guess');
    });

    it('reports no crossover for methane combustion, favoured at every temperature, with the reason', () => {
      const result = crossoverTemperature(methaneCombustion, { tMin: 300, tMax: 3000 });
      expect(result.found).toBeFalse();
      if (result.found) return;
      expect(result.temperature).toBeNull();
      expect(result.reason).toMatch(/negative \(the reaction is favoured\) at every temperature from 300 K to 3000 K/);
    });
  });

  it('finds T* = ΔrH°/ΔrS° exactly under the Ellingham approximation ΔrCp° = 0 (NBS 1982 ammonia: 463.97 K)', () => {
    // NBS 1982 values via issue 3: 92.22 kJ/mol / 198.762 J/(mol·K); ΔrCp° = 0 is the Ellingham
    // approximation (common practice), modelled with Cp = 0 for every participant.
    const participants = [p(-1, nbs('N2(g)')), p(-3, nbs('H2(g)')), p(2, species('NH3(g)', -46.11, 0, 192.45, 0))];
    const result = crossoverTemperature(participants);
    expect(result.found).toBeTrue();
    if (!result.found) return;
    expectWithin(result.temperature, 92220 / 198.762, 1e-6, 'T*');
    expectWithin(result.temperature, 463.97, 0.005, 'T* rounded');
  });

  describe('which term favours the reaction', () => {
    // Definition: the enthalpy term favours when ΔrH° < 0, the entropy term when ΔrS° > 0.
    // Values from the NBS 1982 checks above (methane combustion −890.36 kJ/mol,
    // −242.98 J/(mol·K)) and its reverse; ethane combustion to H2O(g) with NBS 1982 C2H6, O2,
    // CO2 and CODATA 1989 H2O(g): ΔrH° = −1427.82 kJ/mol, ΔrS° ≈ +46.4 J/(mol·K), and its reverse.
    const table: Array<[number, number, string]> = [
      [-890360, -242.98, 'enthalpy'],
      [890360, 242.98, 'entropy'],
      [-1427816, 46.4, 'both'],
      [1427816, -46.4, 'neither'],
    ];
    for (const [dH, dS, expected] of table) {
      it(`ΔrH° = ${dH / 1000} kJ/mol, ΔrS° = ${dS} J/(mol·K) → ${expected}`, () => {
        expect(favouredBy(dH, dS)).toBe(expected);
      });
    }

    it('ethane combustion to H2O(g) is favoured by both terms (sources as above)', () => {
      const water = codata('H2O(g)');
      const r = reactionAt([p(-1, nbs('C2H6(g)')), p(-3.5, nbs('O2(g)')), p(2, nbs('CO2(g)')), p(3, water)], 298.15);
      expectWithin(r.deltaH.value / 1000, 2 * -393.509 + 3 * -241.826 + 84.68, 1e-9, 'ΔrH° / kJ');
      expect(r.favouredBy).toBe('both');
      expect(r.dominantTerm).toBe('enthalpy');
    });
  });
});
