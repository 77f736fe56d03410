import request from 'supertest';
import { createApp } from '../app';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';
import { ADIABATIC_RISE_CAUTION } from '../thermo';
import { expectWithin } from '../thermo/testing/expect-within';
import { CODATA_1989, JANAF, NBS_1982 } from '../thermo/testing/published-values';

// Which source each release recommends (seeds-demo/reference-set.ts): CODATA 1989 first, then JANAF
// 1998 / NASA TM-4513, then NBS 1982. CH4(g) is NBS in 2026.1 and JANAF in 2026.2; CO2(g), H2O(l),
// O2(g), H2(g), NH3(g) are CODATA in both; N2(g) carries the TM-4513 polynomial in both.

describe('reaction computations API', () => {
  let t: TestApp;
  const post = (path: string, body: unknown) => request(t.app).post(`/api/v1/reactions/${path}`).send(body as object);
  const methaneCombustion = 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)';

  beforeAll(async () => {
    t = await testApp();
  });

  describe('evaluate', () => {
    it('methane combustion at 298.15 K from the release 2026.1 values (CODATA 1989 and NBS 1982)', async () => {
      const res = await post('evaluate', { equation: methaneCombustion, temperatures: [298.15], release: '2026.1' }).expect(200);
      // Hess's law on the published values: CODATA 1989 for CO2(g), H2O(l), O2(g); NBS 1982 for CH4(g).
      const dH = CODATA_1989['CO2(g)'].dfH[0] + 2 * CODATA_1989['H2O(l)'].dfH[0] - NBS_1982['CH4(g)'].dfH; // −890.36 kJ/mol
      const dS = CODATA_1989['CO2(g)'].s[0] + 2 * CODATA_1989['H2O(l)'].s[0] - NBS_1982['CH4(g)'].s - 2 * CODATA_1989['O2(g)'].s[0]; // −242.883
      const [r] = res.body.results;
      expectWithin(r.deltaH.value, dH, 1e-9, 'ΔrH° / (kJ/mol)');
      expectWithin(r.deltaS.value, dS, 1e-9, 'ΔrS° / (J/(mol·K))');
      expectWithin(r.deltaG.value, dH - (298.15 * dS) / 1000, 1e-9, 'ΔrG° = ΔrH° − TΔrS°');
      expectWithin(r.log10K.value, (-(dH * 1000 - 298.15 * dS)) / (8.314462618 * 298.15 * Math.LN10), 1e-9, 'log10 K');
      expect([r.deltaH.unit, r.deltaS.unit, r.deltaG.unit, r.deltaCp.unit]).toEqual(['kJ/mol', 'J/(mol·K)', 'kJ/mol', 'J/(mol·K)']);
      expect(r.favouredBy).toBe('enthalpy');
      // NBS 1982 prints no uncertainties: the propagated ones are not given, and a note says why.
      expect(r.deltaH.uncertainty).toBeNull();
      expect(res.body.notes.join(' ')).toContain('CH4(g)');
      // Nobody in 2026.1 holds a Cp° for CO2(g): ΔrCp° is not given rather than invented.
      expect(r.deltaCp.value).toBeNull();
      expect(res.body).toEqual(jasmine.objectContaining({ equation: methaneCombustion, balanced: true, coefficientsFilledIn: false, release: '2026.1', crossoverT: null }));
      expect(res.body.species.map((s: { formula: string; phase: string; coefficient: number; side: string; name: string }) => [s.formula, s.phase, s.coefficient, s.side, s.name])).toEqual([
        ['CH4', 'g', 1, 'reactant', 'methane'],
        ['O2', 'g', 2, 'reactant', 'oxygen'],
        ['CO2', 'g', 1, 'product', 'carbon dioxide'],
        ['H2O', 'l', 2, 'product', 'water'],
      ]);
      expect(res.body.caution).toContain('process-safety review');
      expect(res.body.sources.map((s: { key: string }) => s.key)).toEqual(['codata-1989', 'nbs-1982']);
    });

    it('answers as of the release: the same request pinned to 2026.2 uses JANAF 1998 for CH4(g)', async () => {
      const res = await post('evaluate', { equation: methaneCombustion, release: '2026.2' }).expect(200);
      // JANAF 1998: ΔfH°(CH4, g) = −74.873 kJ/mol, S° = 186.251 J/(mol·K); the rest CODATA 1989.
      const dH = CODATA_1989['CO2(g)'].dfH[0] + 2 * CODATA_1989['H2O(l)'].dfH[0] - JANAF.CH4[298.15].dfH; // −890.297 kJ/mol
      const dS = CODATA_1989['CO2(g)'].s[0] + 2 * CODATA_1989['H2O(l)'].s[0] - JANAF.CH4[298.15].s - 2 * CODATA_1989['O2(g)'].s[0];
      expectWithin(res.body.results[0].deltaH.value, dH, 1e-9, 'ΔrH°(2026.2)');
      expectWithin(res.body.results[0].deltaS.value, dS, 1e-9, 'ΔrS°(2026.2)');
      expect(res.body.results[0].T).toBe(298.15);
      expect(res.body.release).toBe('2026.2');
    });

    it('ammonia synthesis at 298.15 K with propagated uncertainty (CODATA 1989)', async () => {
      const res = await post('evaluate', { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperatures: [298.15], release: '2026.2' }).expect(200);
      const [r] = res.body.results;
      // CODATA 1989: ΔrH° = 2·(−45.94) = −91.88 kJ/mol; ΔrS° = 2·192.77 − 191.609 − 3·130.680 = −198.109 J/(mol·K).
      // (The NBS 1982 tables give −92.22 and −198.76; this release holds CODATA's NH3(g).) S°(N2) comes from
      // the TM-4513 polynomial, which reproduces JANAF's 191.609 to 0.001 J/(mol·K).
      expectWithin(r.deltaH.value, 2 * CODATA_1989['NH3(g)'].dfH[0], 1e-9, 'ΔrH°');
      expectWithin(r.deltaS.value, 2 * CODATA_1989['NH3(g)'].s[0] - CODATA_1989['N2(g)'].s[0] - 3 * CODATA_1989['H2(g)'].s[0], 0.002, 'ΔrS°');
      // GUM: u(ΔrH°) = 2·u(ΔfH°(NH3)), CODATA's ± 0.35 kJ/mol being U with k = 2.
      expectWithin(r.deltaH.uncertainty, 2 * (CODATA_1989['NH3(g)'].dfH[1] / 2), 1e-9, 'u(ΔrH°)');
      expect(r.log10K.uncertainty).toBeGreaterThan(0);
      expect(r.K).toBeCloseTo(10 ** r.log10K.value, -2);
    });

    it('fills in missing coefficients when the balance is unique', async () => {
      const res = await post('evaluate', { equation: 'CH4(g) + O2(g) -> CO2(g) + H2O(l)', release: '2026.1' }).expect(200);
      expect([res.body.equation, res.body.coefficientsFilledIn]).toEqual([methaneCombustion, true]);
    });

    it('names species that are missing, ambiguous or out of range (422)', async () => {
      const ambiguous = await post('evaluate', { equation: 'CH4 + 2 O2 -> CO2 + 2 H2O', release: '2026.2' }).expect(422);
      expect(ambiguous.body.details.ambiguous).toEqual(['H2O']);
      expect(ambiguous.body.details.suggestions.H2O.map((s: { phase: string }) => s.phase).sort()).toEqual(['g', 'l']);
      expect(ambiguous.body.message).toContain('H2O');

      const missing = await post('evaluate', { equation: 'C3H8(g) + 5 O2(g) -> 3 CO2(g) + 4 H2O(l)', release: '2026.2' }).expect(422);
      expect(missing.body.details.missing).toEqual(['C3H8(g)']);

      const wrongPhase = await post('evaluate', { equation: 'CO2(cr) -> CO2(g)', release: '2026.2' }).expect(422);
      expect(wrongPhase.body.details.missing).toEqual(['CO2(cr)']);
      expect(wrongPhase.body.details.suggestions['CO2(cr)'][0]).toEqual(jasmine.objectContaining({ name: 'carbon dioxide', phase: 'g' }));

      // The TM-4513 polynomials hold from 200 K to 6000 K: beyond that every species is out of range.
      const outOfRange = await post('evaluate', { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperatures: [298.15, 7000], release: '2026.2' }).expect(422);
      const labels = outOfRange.body.details.outOfRange.map((o: { species: string }) => o.species).sort();
      expect(labels).toEqual(['H2(g)', 'N2(g)', 'NH3(g)']);
      expect(outOfRange.body.details.outOfRange[0]).toEqual(jasmine.objectContaining({ tMin: 200, tMax: 6000, temperatures: [7000] }));
    });

    it('extrapolates only when asked, and flags what it extrapolated', async () => {
      // Beyond the polynomials' 6000 K the ranges are extended only when asked, and flagged.
      const res = await post('evaluate', { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperatures: [298.15, 7000], extrapolate: true, release: '2026.2' }).expect(200);
      expect(res.body.results.map((r: { T: number; extrapolated: boolean }) => [r.T, r.extrapolated])).toEqual([[298.15, false], [7000, true]]);
      expect(res.body.notes.join(' ')).toContain('extrapolated');
      // The extrapolated row still obeys ΔrG° = ΔrH° − T·ΔrS° (common practice; kJ vs J/K units).
      const hot = res.body.results[1];
      expect(hot.deltaG.value).toBeCloseTo(hot.deltaH.value - (7000 * hot.deltaS.value) / 1000, 6);
      await post('evaluate', { equation: 'N2(g) -> N2(g)' }).expect(422);
    });

    it('refuses unbalanced equations and malformed input', async () => {
      const unbalanced = await post('evaluate', { equation: '1 CH4(g) + 1 O2(g) -> 1 CO2(g) + 2 H2O(l)' }).expect(422);
      expect(unbalanced.body.message).toContain('does not balance');
      expect(unbalanced.body.details.elementExcess).toEqual({ O: -2 });
      const syntax = await post('evaluate', { equation: 'CH4(g) + 2 O2(g) CO2(g)' }).expect(400);
      expect(syntax.body.message).toContain('no arrow');
      const badElement = await post('evaluate', { equation: 'Xx(g) -> Xx(g)' }).expect(400);
      expect(badElement.body.details).toEqual(jasmine.objectContaining({ parameter: 'equation', column: 0 }));
      expect((await post('evaluate', { equation: methaneCombustion, temperatures: [] }).expect(400)).body.message).toContain('temperatures');
      expect((await post('evaluate', { equation: methaneCombustion, temperatures: [-1] }).expect(400)).body.details.parameter).toBe('temperatures');
      expect((await post('evaluate', { equation: methaneCombustion, temperatures: ['hot'] }).expect(400)).body.message).toContain('temperatures');
      expect((await post('evaluate', { equation: methaneCombustion, tMin: 1000, tMax: 300, tStep: 10 }).expect(400)).body.message).toContain('must not exceed');
      expect((await post('evaluate', { equation: methaneCombustion, release: 'newest' }).expect(400)).body.message).toContain('release');
      await post('evaluate', { equation: methaneCombustion, release: '1999.1' }).expect(404);
      expect((await post('evaluate', { equation: methaneCombustion, colour: 'blue' }).expect(400)).body.message).toContain('/body/colour');
      await post('evaluate', {}).expect(400);
    });

    it('accepts read-only API keys when public reading is off (a computation writes nothing)', async () => {
      const reader = await bearerFor(t.app, 'reader');
      const key = await request(t.app).post('/api/v1/api-keys').set('Authorization', reader).send({ name: `simulator ${Date.now()}` }).expect(201);
      expect(key.body.scope).toBe('read');
      const closed = createApp({ config: { ...t.config, publicRead: false }, dataSource: t.dataSource, store: t.store, mail: t.mail });
      const body = { equation: methaneCombustion, release: '2026.1' };
      await request(closed).post('/api/v1/reactions/evaluate').send(body).expect(401);
      const res = await request(closed).post('/api/v1/reactions/evaluate').set('X-API-Key', key.body.secret).send(body).expect(200);
      expect(res.body.release).toBe('2026.1');
      expect((await request(closed).get('/api/v1/species?formula=CH4').set('X-API-Key', key.body.secret).expect(200)).headers['cache-control']).toBe('private, max-age=60');
      await request(t.app).delete(`/api/v1/api-keys/${key.body.id}`).set('Authorization', reader).expect(204);
    });
  });

  describe('balance', () => {
    it('balances by exact arithmetic and keeps written coefficients', async () => {
      const res = await post('balance', { equation: 'C3H8 + O2 -> CO2 + H2O' }).expect(200);
      expect(res.body).toEqual({
        equation: 'C3H8 + 5 O2 -> 3 CO2 + 4 H2O',
        coefficients: [1, 5, 3, 4],
        species: [
          { formula: 'C3H8', phase: null, coefficient: 1, side: 'reactant' },
          { formula: 'O2', phase: null, coefficient: 5, side: 'reactant' },
          { formula: 'CO2', phase: null, coefficient: 3, side: 'product' },
          { formula: 'H2O', phase: null, coefficient: 4, side: 'product' },
        ],
        balanced: true,
      });
      const half = await post('balance', { equation: 'H2(g) + O2(g) -> 1 H2O(l)' }).expect(200);
      expect(half.body.coefficients).toEqual([1, 0.5, 1]);
      expect(half.body.species[1]).toEqual({ formula: 'O2', phase: 'g', coefficient: 0.5, side: 'reactant' });
    });

    it('says why no balance, or no unique one, exists', async () => {
      const notUnique = await post('balance', { equation: 'H2 + O2 -> H2O + H2O2' }).expect(422);
      expect(notUnique.body.details).toEqual(jasmine.objectContaining({ status: 'not-unique', degreesOfFreedom: 2 }));
      const impossible = await post('balance', { equation: 'H2 -> O2' }).expect(422);
      expect(impossible.body.details.status).toBe('impossible');
      expect(impossible.body.message).toContain('one side only');
      await post('balance', { equation: '' }).expect(400);
    });
  });

  describe('derive-formation', () => {
    it("gives back NBS 1982's ΔfH°(C2H5OH, l) from the combustion enthalpy those tables imply (Hess's law)", async () => {
      // ΔcH° = 2·ΔfH°(CO2) + 3·ΔfH°(H2O, l) − ΔfH°(C2H5OH, l) with CODATA 1989 and NBS 1982 values.
      const combustion = 2 * CODATA_1989['CO2(g)'].dfH[0] + 3 * CODATA_1989['H2O(l)'].dfH[0] - NBS_1982['C2H5OH(l)'].dfH; // −1366.82 kJ/mol
      const res = await post('derive-formation', {
        equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)',
        reactionEnthalpy: { value: combustion * 1000, uncertainty: 300 },
        target: 'C2H5OH(l)',
        release: '2026.2',
      }).expect(200);
      expect(res.body.target).toBe('C2H5OH(l)');
      expectWithin(res.body.deltaFH.value, NBS_1982['C2H5OH(l)'].dfH, 1e-9, 'ΔfH°(C2H5OH, l) / (kJ/mol)');
      expect(res.body.deltaFH.unit).toBe('kJ/mol');
      // GUM: u² = u²(ΔcH) + 2²u²(CO2) + 3²u²(H2O), CODATA ± being U with k = 2.
      const u = Math.hypot(0.3, 2 * (CODATA_1989['CO2(g)'].dfH[1] / 2), 3 * (CODATA_1989['H2O(l)'].dfH[1] / 2));
      expectWithin(res.body.deltaFH.uncertainty, u, 1e-9, 'u(ΔfH°)');
      const contributions = Object.fromEntries(res.body.contributions.map((c: { species: string; uncertaintyContribution: number }) => [c.species, c.uncertaintyContribution]));
      expectWithin(contributions['measured ΔrH°'], 0.3, 1e-12, 'measured ΔrH° contribution');
      expectWithin(contributions['CO2(g)'], 0.13, 1e-12, 'CO2 contribution');
      expect(res.body.contributions.find((c: { species: string }) => c.species === 'CO2(g)').source.key).toBe('codata-1989');
    });

    it('refuses a target that is not in the equation and a malformed body', async () => {
      const res = await post('derive-formation', { equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', reactionEnthalpy: { value: -1366800, uncertainty: 300 }, target: 'CH3OH(l)' }).expect(422);
      expect(res.body.message).toContain('does not appear');
      await post('derive-formation', { equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', reactionEnthalpy: { value: -1366800, uncertainty: -1 }, target: 'C2H5OH(l)' }).expect(400);
      await post('derive-formation', { equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', target: 'C2H5OH(l)' }).expect(400);
    });
  });

  describe('adiabatic-rise', () => {
    it('gives ΔT_ad = −ΔrH·n/(m·c_p) with the screening caution', async () => {
      const res = await post('adiabatic-rise', { deltaH: -890360, amount: 2, mass: 50, specificHeat: 4184 }).expect(200);
      expectWithin(res.body.deltaT, (890360 * 2) / (50 * 4184), 1e-12, 'ΔT_ad / K');
      expect(res.body.unit).toBe('K');
      expect(res.body.caution).toBe(ADIABATIC_RISE_CAUTION);
    });

    it('refuses impossible inputs', async () => {
      expect((await post('adiabatic-rise', { deltaH: -1000, amount: 1, mass: 0, specificHeat: 4000 }).expect(422)).body.details.parameter).toBe('mass');
      await post('adiabatic-rise', { deltaH: -1000, amount: -1, mass: 1, specificHeat: 4000 }).expect(400);
      await post('adiabatic-rise', { deltaH: 'a lot', amount: 1, mass: 1, specificHeat: 4000 }).expect(400);
    });
  });
});
