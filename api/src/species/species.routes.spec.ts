import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';
import { expectWithin } from '../thermo/testing/expect-within';
import { CODATA_1989, JANAF, NBS_1982 } from '../thermo/testing/published-values';

// The demo database holds the reference releases of seeds-demo/reference-set.ts: 2026.1 (CODATA 1989,
// NBS 1982, the TM-4513 polynomial of N2) and 2026.2 (adds JANAF 1998 at 298.15 K and the TM-4513
// polynomials of H2O, H2, O2, CO, CO2, CH4 and NH3 (g)); 2027.1 is in preparation. Recommended: CODATA, then JANAF / NASA, then NBS.

interface Summary {
  id: string;
  formula: string;
  hillFormula: string;
  name: string;
  phases: { phase: string; polymorph: string | null }[];
}

describe('species API', () => {
  let t: TestApp;
  const ids: Record<string, string> = {};
  const search = (query: string) => request(t.app).get(`/api/v1/species?${query}`);

  beforeAll(async () => {
    t = await testApp();
    const rows: { id: string; name: string }[] = await t.dataSource.query(`SELECT id, name FROM species`);
    for (const r of rows) ids[r.name] = r.id;
  });

  describe('search', () => {
    it('finds a species however its formula is typed, matched on the Hill formula', async () => {
      for (const formula of ['C2H5OH', 'CH3CH2OH', 'C2H6O', 'HOCH2CH3']) {
        const res = await search(`formula=${encodeURIComponent(formula)}&release=2026.2`).expect(200);
        expect(res.body.items.map((s: Summary) => s.name)).withContext(formula).toEqual(['ethanol']);
        expect(res.body.items[0]).toEqual(jasmine.objectContaining({ formula: 'C2H5OH', hillFormula: 'C2H6O', charge: 0 }));
      }
      const gas = await search(`formula=${encodeURIComponent('H2O(g)')}&release=2026.2`).expect(200);
      expect(gas.body.items.map((s: Summary) => s.name)).toEqual(['water']);
    });

    it('answers q by name, synonym, CAS RN, InChIKey and formula, best match first', async () => {
      const byName = await search('q=water&release=2026.2').expect(200);
      expect(byName.body.items[0].name).toBe('water');
      const bySynonym = await search('q=ethyl%20alcohol&release=2026.2').expect(200);
      expect(bySynonym.body.items[0].name).toBe('ethanol');
      const byPrefix = await search('q=meth&release=2026.2').expect(200);
      expect(byPrefix.body.items.map((s: Summary) => s.name)).toContain('methane');
      expect((await search('q=7732-18-5&release=2026.2').expect(200)).body.items[0].name).toBe('water');
      expect((await search('q=XLYOFNOQVPJJNP-UHFFFAOYSA-N&release=2026.2').expect(200)).body.items[0].name).toBe('water');
      expect((await search('q=CO2&release=2026.2').expect(200)).body.items[0].name).toBe('carbon dioxide');
      const nothing = await search('q=unobtainium&release=2026.2').expect(200);
      expect([nothing.body.items, nothing.body.total]).toEqual([[], 0]);
    });

    it('filters by elements (contains / only), phase and quantity, and lists the phases held', async () => {
      const only = await search('elements=C,H,O&elementsMode=only&pageSize=100&release=2026.2').expect(200);
      const names = only.body.items.map((s: Summary) => s.name);
      expect(names).toContain('methane');
      expect(names).toContain('ethanol');
      expect(names).toContain('oxygen');
      expect(names).not.toContain('ammonia');
      expect(names).not.toContain('nitrogen');
      const contains = await search('elements=N&pageSize=100&release=2026.2').expect(200);
      expect(contains.body.items.map((s: Summary) => s.name).sort()).toEqual(['ammonia', 'nitrogen', 'nitrogen atom']);
      const crystals = await search('phase=cr&pageSize=100&release=2026.2').expect(200);
      expect(crystals.body.items.map((s: Summary) => s.name).sort()).toEqual(['carbon', 'sulfur']);
      const graphite = await search(`phase=${encodeURIComponent('cr, graphite')}`).expect(200);
      expect(graphite.body.items.map((s: Summary) => s.name)).toEqual(['carbon']);
      const carbon = graphite.body.items[0] as Summary;
      expect(carbon.phases).toEqual([{ phase: 'cr', polymorph: 'graphite' }, { phase: 'g', polymorph: null }]);
      // Only the NBS tables give ΔfG° in 2026.1 (CODATA 1989 gives none).
      const withDfG = await search('quantity=dfG&pageSize=100&release=2026.1').expect(200);
      expect(withDfG.body.items.map((s: Summary) => s.name)).toContain('methane');
      expect(withDfG.body.items.map((s: Summary) => s.name)).not.toContain('ammonia');
    });

    it('sorts and pages', async () => {
      const light = await search('sort=molarMass&pageSize=1&release=2026.2').expect(200);
      expect(light.body.items[0].name).toBe('hydrogen');
      const heavy = await search('sort=-molarMass&pageSize=1&release=2026.2').expect(200);
      expect(heavy.body.items[0].name).toBe('chlorine');
      const byFormula = await search('sort=formula&pageSize=100&release=2026.2').expect(200);
      const hills = byFormula.body.items.map((s: Summary) => s.hillFormula);
      expect(hills).toEqual([...hills].sort());
      const page1 = await search('sort=name&pageSize=3&page=1&release=2026.2').expect(200);
      const page2 = await search('sort=name&pageSize=3&page=2&release=2026.2').expect(200);
      expect(page1.body.total).toBe(page2.body.total);
      expect([page1.body.page, page1.body.pageSize, page2.body.page]).toEqual([1, 3, 2]);
      const both = [...page1.body.items, ...page2.body.items].map((s: Summary) => s.name);
      expect(new Set(both).size).toBe(6);
      const beyond = await search('pageSize=3&page=999&release=2026.2').expect(200);
      expect([beyond.body.items, beyond.body.total]).toEqual([[], page1.body.total]);
    });

    it('answers from the release asked for: propan-1-ol first appears in 2026.2', async () => {
      const before = await search('q=propan-1-ol&release=2026.1').expect(200);
      const after = await search('q=propan-1-ol&release=2026.2').expect(200);
      expect([before.body.total, before.body.release]).toEqual([0, '2026.1']);
      expect([after.body.total, after.body.release, after.body.items[0].name]).toEqual([1, '2026.2', 'propan-1-ol']);
    });

    it('refuses malformed parameters with a 400 naming them', async () => {
      const badFormula = await search('formula=H2Xx&release=2026.2').expect(400);
      expect(badFormula.body.message).toContain("unknown element 'Xx'");
      expect(badFormula.body.details).toEqual(jasmine.objectContaining({ parameter: 'formula', column: 2 }));
      expect((await search('sort=weight&release=2026.2').expect(400)).body.message).toContain('sort');
      expect((await search('pageSize=500&release=2026.2').expect(400)).body.message).toContain('pageSize');
      expect((await search('page=0&release=2026.2').expect(400)).body.message).toContain('page');
      expect((await search('phase=plasma&release=2026.2').expect(400)).body.message).toContain("unknown phase 'plasma'");
      expect((await search('elements=C,Qq&release=2026.2').expect(400)).body.message).toContain('Qq');
      expect((await search('elementsMode=some&release=2026.2').expect(400)).body.message).toContain('elementsMode');
      expect((await search('quantity=density&release=2026.2').expect(400)).body.message).toContain('quantity');
      expect((await search('release=latest').expect(400)).body.message).toContain('release');
      expect((await search('colour=blue&release=2026.2').expect(400)).body.message).toContain("Unknown query parameter 'colour'");
      await search('release=1999.1').expect(404);
    });

    it('shows a release in preparation to editors only', async () => {
      await search('release=2027.1').expect(404);
      const editor = await search('q=ethyl%20acetate&release=2027.1').set('Authorization', await bearerFor(t.app, 'editor')).expect(200);
      expect(editor.body.items.map((s: Summary) => s.name)).toEqual(['ethyl acetate']);
      expect(editor.headers['cache-control']).toBe('private, no-store');
      await search('release=2027.1').set('Authorization', await bearerFor(t.app, 'reader')).expect(404);
    });

    it('caches a named published release for a year and answers 304 to its ETag', async () => {
      const pinned = await search('formula=CH4&release=2026.1').expect(200);
      expect(pinned.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(pinned.headers.etag).toBeTruthy();
      await search('formula=CH4&release=2026.1').set('If-None-Match', pinned.headers.etag).expect(304);
      const latest = await search('formula=CH4').expect(200);
      expect(latest.headers['cache-control']).toBe('public, max-age=60');
    });
  });

  describe('detail', () => {
    it('gives identifiers, each quantity with its recommended value, alternatives and sources', async () => {
      const res = await request(t.app).get(`/api/v1/species/${ids.methane}?release=2026.2`).expect(200);
      expect(res.body).toEqual(jasmine.objectContaining({ formula: 'CH4', hillFormula: 'CH4', name: 'methane', charge: 0, release: '2026.2' }));
      expect(res.body.identifiers).toEqual({ inchi: 'InChI=1S/CH4/h1H4', inchiKey: 'VNWKTOKETHGBQD-UHFFFAOYSA-N', casRn: '74-82-8', smiles: 'C' });
      const gas = res.body.phases.find((p: { phase: string }) => p.phase === 'g');
      const dfH = gas.quantities.find((q: { quantity: string }) => q.quantity === 'dfH');
      expect([dfH.symbol, dfH.unit]).toEqual(['ΔfH°', 'J/mol']);
      // 2026.2 recommends JANAF 1998 over NBS 1982 (JANAF: ΔfH°(CH4, g) = −74.873 kJ/mol).
      expect(dfH.recommended.value).toBe(JANAF.CH4[298.15].dfH * 1000);
      expect(dfH.recommended.source.key).toBe('janaf-1998');
      expect(dfH.recommended.source.citation).toContain('NIST-JANAF Thermochemical Tables');
      expect(dfH.alternatives.map((v: { value: number; source: { key: string } }) => [v.source.key, v.value])).toEqual([['nbs-1982', NBS_1982['CH4(g)'].dfH * 1000]]);
      expect(dfH.recommended).toEqual(jasmine.objectContaining({ temperature: 298.15, pressure: 100000, method: 'evaluated', unit: 'J/mol' }));
    });

    it('answers as of the release: the same request pinned to two releases gives two answers', async () => {
      const recommendedDfH = async (release: string) => {
        const res = await request(t.app).get(`/api/v1/species/${ids.methane}?release=${release}`).expect(200);
        const gas = res.body.phases.find((p: { phase: string }) => p.phase === 'g');
        return gas.quantities.find((q: { quantity: string }) => q.quantity === 'dfH').recommended;
      };
      // NBS 1982: −74.81 kJ/mol (the only source in 2026.1); JANAF 1998: −74.873 kJ/mol in 2026.2.
      expect((await recommendedDfH('2026.1')).value).toBe(NBS_1982['CH4(g)'].dfH * 1000);
      expect((await recommendedDfH('2026.2')).value).toBe(JANAF.CH4[298.15].dfH * 1000);
    });

    it('keeps the version history as of the release', async () => {
      const historyIn = async (release: string) => {
        const res = await request(t.app).get(`/api/v1/species/${ids.carbon}?release=${release}`).expect(200);
        const gas = res.body.phases.find((p: { phase: string }) => p.phase === 'g');
        return gas.quantities.find((q: { quantity: string }) => q.quantity === 'dfH').recommended;
      };
      // Version 1 of ΔfH°(C, g) went into 2026.1 without its uncertainty; version 2 (2026.2) adds CODATA's ± 0.45 kJ/mol.
      const v1 = await historyIn('2026.1');
      expect([v1.versionNo, v1.uncertainty]).toEqual([1, null]);
      expect(v1.history.map((h: { versionNo: number; releases: string[] }) => [h.versionNo, h.releases])).toEqual([[1, ['2026.1']]]);
      const v2 = await historyIn('2026.2');
      expect([v2.versionNo, v2.uncertainty, v2.uncertaintyKind, v2.coverageFactor]).toEqual([2, 450, 'expanded', 2]);
      expect(v2.lineageId).toBe(v1.lineageId);
      expect(v2.history.map((h: { versionNo: number; uncertainty: number | null; releases: string[] }) => [h.versionNo, h.uncertainty, h.releases]))
        .toEqual([[1, null, ['2026.1']], [2, 450, ['2026.2']]]);
    });

    it('lists heat-capacity fits with their source and range', async () => {
      const res = await request(t.app).get(`/api/v1/species/${ids.nitrogen}?release=2026.1`).expect(200);
      const [fit] = res.body.phases[0].fits;
      expect(fit).toEqual(jasmine.objectContaining({ form: 'nasa7', tMin: 200, tMax: 6000, recommended: true }));
      expect(fit.source.key).toBe('nasa-tm-4513');
      expect(fit.ranges.length).toBe(2);
    });

    it('is a 404 for an unknown species or one not in the release, a 400 for a malformed id', async () => {
      await request(t.app).get('/api/v1/species/00000000-0000-4000-8000-000000000000').expect(404);
      const absent = await request(t.app).get(`/api/v1/species/${ids['propan-1-ol']}?release=2026.1`).expect(404);
      expect(absent.body.message).toContain('2026.1');
      await request(t.app).get('/api/v1/species/not-a-uuid').expect(400);
    });
  });

  describe('properties', () => {
    const properties = (name: string, query: string) => request(t.app).get(`/api/v1/species/${ids[name]}/properties?${query}`);

    it('reproduces JANAF 1998 for H2O(g) at 1000 K from the NASA TM-4513 polynomial (release 2026.2)', async () => {
      const res = await properties('water', 'phase=g&T=298.15,1000&release=2026.2').expect(200);
      expect(res.body.fit).toEqual(jasmine.objectContaining({ form: 'nasa7', tMin: 200, tMax: 6000, source: 'nasa-tm-4513' }));
      const row = res.body.rows[1];
      const janaf = JANAF.H2O[1000];
      // NIST-JANAF 4th ed. (Chase 1998), H2O(g) at 1000 K; the TM-4513 fit agrees to ~0.1 % in Cp.
      expect(row.T).toBe(1000);
      expect(row.extrapolated).toBeFalse();
      expectWithin(row.Cp.value, janaf.cp, 0.05, 'Cp°(1000 K) / (J/(mol·K))');
      expectWithin(row.S.value, janaf.s, 0.01, 'S°(1000 K) / (J/(mol·K))');
      expectWithin(row.HminusH298.value, janaf.dh, 0.005, 'H° − H°(298.15 K) / (kJ/mol)');
      expectWithin(row.gibbsEnergyFunction.value, janaf.gef, 0.01, '−(G° − H°298)/T / (J/(mol·K))');
      expect([row.Cp.unit, row.HminusH298.unit]).toEqual(['J/(mol·K)', 'kJ/mol']);
      // ΔfH°(T), ΔfG°(T) and log10 Kf use the TM-4513 polynomials of H2(g) and O2(g) in the same
      // release; NIST-JANAF (Chase 1998), H2O(g) at 1000 K: ΔfH° = −247.857, ΔfG° = −192.590 kJ/mol.
      expectWithin(row.deltaFH.value, janaf.dfH, 0.02, 'ΔfH°(1000 K) / (kJ/mol)');
      expectWithin(row.deltaFG.value, janaf.dfG, 0.03, 'ΔfG°(1000 K) / (kJ/mol)');
      expectWithin(row.log10Kf.value, (-janaf.dfG * 1000) / (8.314462618 * 1000 * Math.LN10), 0.002, 'log10 Kf(1000 K)');
      // The fit's own S°(298.15 K) differs from CODATA's recommended value by a few thousandths: said in a note.
      expect(res.body.notes.join(' ')).toContain('anchored to the recommended value');
      // At 298.15 K: ΔfH° is CODATA 1989's; ΔfG° from it and S° of H2O(g), H2(g), O2(g) agrees with JANAF's −228.582 kJ/mol.
      const at298 = res.body.rows[0];
      expectWithin(at298.deltaFH.value, CODATA_1989['H2O(g)'].dfH[0], 1e-9, 'ΔfH°(298.15 K)');
      expectWithin(at298.deltaFH.uncertainty, CODATA_1989['H2O(g)'].dfH[1] / 2, 1e-9, 'u(ΔfH°): CODATA ± is U with k = 2');
      expectWithin(at298.deltaFG.value, JANAF.H2O[298.15].dfG, 0.01, 'ΔfG°(298.15 K)');
      expectWithin(at298.log10Kf.value, (-JANAF.H2O[298.15].dfG * 1000) / (8.314462618 * 298.15 * Math.LN10), 0.002, 'log10 Kf');
    });

    it('reproduces JANAF for N2(g) at 1000 K, a grid of temperatures and kcal units', async () => {
      const res = await properties('nitrogen', 'Tmin=300&Tmax=1000&Tstep=100&release=2026.1').expect(200);
      expect(res.body.rows.map((r: { T: number }) => r.T)).toEqual([300, 400, 500, 600, 700, 800, 900, 1000]);
      const row = res.body.rows[7];
      // N2 is its element's reference state: ΔfH° = ΔfG° = 0 at every T.
      expect([row.deltaFH.value, row.deltaFG.value, row.log10Kf.value]).toEqual([0, 0, 0]);
      expectWithin(row.Cp.value, JANAF.N2[1000].cp, 0.05, 'Cp°(N2, 1000 K)');
      expectWithin(row.S.value, JANAF.N2[1000].s, 0.01, 'S°(N2, 1000 K)');
      expectWithin(row.HminusH298.value, JANAF.N2[1000].dh, 0.005, 'H° − H°298 (N2, 1000 K)');
      const kcal = await properties('nitrogen', 'T=1000&units=kcal&release=2026.1').expect(200);
      expect(kcal.body.units).toBe('kcal');
      expectWithin(kcal.body.rows[0].HminusH298.value, JANAF.N2[1000].dh / 4.184, 0.002, 'H° − H°298 in kcal/mol (thermochemical calorie)');
      expectWithin(kcal.body.rows[0].Cp.value, JANAF.N2[1000].cp / 4.184, 0.012, 'Cp° in cal/(mol·K)');
      expect([kcal.body.rows[0].HminusH298.unit, kcal.body.rows[0].Cp.unit]).toEqual(['kcal/mol', 'cal/(mol·K)']);
    });

    it('answers as of the release: H2O(g) has no polynomial in 2026.1, so 1000 K is out of range there', async () => {
      const res = await properties('water', 'phase=g&T=1000&release=2026.1').expect(422);
      expect(res.body.message).toContain('T = 1000 K');
      expect(res.body.details).toEqual(jasmine.objectContaining({ parameter: 'T', temperatures: [1000] }));
      await properties('water', 'phase=g&T=1000&release=2026.2').expect(200);
    });

    it('refuses a temperature outside the fit unless extrapolation is asked for, then flags the row', async () => {
      const refused = await properties('nitrogen', 'T=7000&release=2026.1').expect(422);
      expect(refused.body.message).toContain('200–6000 K');
      expect(refused.body.details).toEqual(jasmine.objectContaining({ temperatures: [7000], tMin: 200, tMax: 6000 }));
      const flagged = await properties('nitrogen', 'T=7000&extrapolate=true&release=2026.1').expect(200);
      expect(flagged.body.rows[0].extrapolated).toBeTrue();
      expect(flagged.body.notes.join(' ')).toContain('extrapolated');
    });

    it('refuses malformed parameters with a 400 naming them', async () => {
      expect((await properties('water', 'phase=g&T=300,abc').expect(400)).body.details).toEqual(jasmine.objectContaining({ parameter: 'T', index: 1 }));
      expect((await properties('water', 'phase=g&T=-5').expect(400)).body.details.parameter).toBe('T');
      expect((await properties('water', 'phase=g&Tmin=1000&Tmax=300&Tstep=10').expect(400)).body.message).toContain('must not exceed');
      expect((await properties('water', 'phase=g&Tmin=300&Tmax=1000').expect(400)).body.message).toContain('Tstep');
      expect((await properties('water', 'phase=g&Tmin=300&Tmax=5000&Tstep=1').expect(400)).body.message).toContain('at most 2000');
      expect((await properties('water', 'phase=g&T=300&Tmin=300&Tmax=400&Tstep=10').expect(400)).body.message).toContain('not both');
      expect((await properties('water', 'phase=vapour').expect(400)).body.message).toContain("unknown phase 'vapour'");
      expect((await properties('water', 'T=298.15').expect(400)).body.message).toContain('phase is required');
      expect((await properties('water', 'phase=g&units=BTU').expect(400)).body.message).toContain('units');
      expect((await properties('water', 'phase=g&extrapolate=yes').expect(400)).body.message).toContain('extrapolate');
      await properties('water', 'phase=cr').expect(404);
      await properties('water', 'phase=g&release=2099.1').expect(404);
    });
  });
});
