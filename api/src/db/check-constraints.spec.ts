import fc from 'fast-check';
import { translateDatabaseError } from '../shared/database-errors';
import { HeatCapacityFit } from '../values/heat-capacity-fit.entity';
import { fitRangeProblems } from '../values/fit-ranges';
import { addFit } from '../values/value-versions';
import { CONSTRAINT_MESSAGES } from './constraint-messages';
import { catalogueFixture, type CatalogueFixture } from './spec-fixtures';
import { attempt, inRolledBackTransaction, type DatabaseRefusal } from './test-database';
import type { EntityManager } from 'typeorm';

/** The refusal names the rule, the catalogue explains it, and the API answers 4xx — never 500. */
function expectRule(refusal: DatabaseRefusal | undefined, constraint: string): void {
  expect(refusal).withContext(`expected ${constraint} to refuse the row`).toBeDefined();
  expect(refusal?.constraint).toBe(constraint);
  expect(CONSTRAINT_MESSAGES[constraint]).withContext(constraint).toBeDefined();
  const status = translateDatabaseError(refusal?.error)?.status;
  expect(status === 409 || status === 422).withContext(`${constraint} → ${status}`).toBeTrue();
}

function nasa7(f: CatalogueFixture, ranges: unknown, tMin = 200, tMax = 6000) {
  const coefficients = [3.5, 1e-4, -5e-7, 2e-9, -1e-12, -1000, 3];
  return {
    speciesPhaseId: f.gas.id, form: 'nasa7' as const, tMinK: tMin, tMaxK: tMax,
    ranges: (ranges ?? [{ tMin: 200, tMax: 1000, coefficients }, { tMin: 1000, tMax: 6000, coefficients }]) as HeatCapacityFit['ranges'],
    pressurePa: 100000, method: 'evaluated' as const, levelOfTheory: null, sourceId: f.source.id, sourceLocator: null,
    enteredBy: null, approvedBy: null, proposalItemId: null, notes: null,
  };
}

describe('CHECK constraints and triggers', () => {
  it('refuse thermochemical values that break the rules of the trade', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const refused = (overrides: Parameters<CatalogueFixture['value']>[0]) => attempt(m, () => f.value(overrides));

      expectRule(await refused({ uncertaintySi: -1 }), 'thermo_values_uncertainty_nonnegative');
      expectRule(await refused({ temperatureK: 0 }), 'thermo_values_temperature_positive');
      expectRule(await refused({ temperatureK: -10 }), 'thermo_values_temperature_positive');
      expectRule(await refused({ quantity: 'S', valueSi: -5, enteredUnit: 'J/(mol·K)' }), 'thermo_values_entropy_positive');
      expectRule(await refused({ quantity: 'S', valueSi: 0, enteredUnit: 'J/(mol·K)' }), 'thermo_values_entropy_positive');
      expectRule(await refused({ quantity: 'Cp', valueSi: -29, enteredUnit: 'J/(mol·K)' }), 'thermo_values_heat_capacity_positive');
      expectRule(await refused({ quantity: 'dtrsH', transitionKind: 'fus', valueSi: -6000 }), 'thermo_values_transition_endothermic');
      expectRule(await refused({ quantity: 'dtrsH' }), 'thermo_values_transition_kind');
      expectRule(await refused({ transitionKind: 'vap', valueSi: 30000 }), 'thermo_values_transition_kind');
      expectRule(await refused({ pressurePa: 100 }), 'thermo_values_standard_pressure');
      expectRule(await refused({ uncertaintyKind: 'expanded' }), 'thermo_values_coverage_factor');
      expectRule(await refused({ coverageFactor: 2 }), 'thermo_values_coverage_factor');
      expectRule(await refused({ uncertaintyKind: null }), 'thermo_values_uncertainty_kind_stated');
      expectRule(await refused({ method: 'computed' }), 'thermo_values_level_of_theory');
      expectRule(await refused({ valueSi: Number.NaN }), 'thermo_values_value_finite');
      expectRule(await refused({ valueSi: Number.POSITIVE_INFINITY }), 'thermo_values_value_finite');
      expectRule(await refused({ enteredValue: ' ' }), 'thermo_values_entered_present');
      expect(await attempt(m, `INSERT INTO thermo_values (species_phase_id, quantity, value_si, temperature_k, pressure_pa, method, source_id, entered_value, entered_unit)
                                 VALUES ($1, 'dfH', 1, 298.15, 100000, 'measured', NULL, '1', 'J/mol')`, [f.gas.id]))
        .withContext('no value without a source').toEqual(jasmine.objectContaining({ code: '23502' }));

      // The accepted edge cases.
      expect(await refused({ uncertaintySi: 0 })).toBeUndefined();
      expect(await refused({ uncertaintyKind: 'expanded', coverageFactor: 2 })).toBeUndefined();
      expect(await refused({ method: 'computed', levelOfTheory: 'G4' })).toBeUndefined();
      expect(await refused({ quantity: 'dtrsH', transitionKind: 'trs', valueSi: -200, transitionLabel: 'cr, II → cr, I' })).toBeUndefined();
      expect(await refused({ pressurePa: 101325 })).toBeUndefined();
    });
  });

  it('refuse malformed heat-capacity fits, with the same verdict as the TypeScript check', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const c7 = [1, 0, 0, 0, 0, 0, 0];
      expect(await attempt(m, () => addFit(m, nasa7(f, undefined)))).toBeUndefined();
      expectRule(await attempt(m, () => addFit(m, nasa7(f, [{ tMin: 200, tMax: 900, coefficients: c7 }, { tMin: 1000, tMax: 6000, coefficients: c7 }]))), 'heat_capacity_fits_ranges_valid');
      expectRule(await attempt(m, () => addFit(m, nasa7(f, [{ tMin: 200, tMax: 6000, coefficients: [1, 2, 3] }]))), 'heat_capacity_fits_ranges_valid');
      expectRule(await attempt(m, () => addFit(m, nasa7(f, []))), 'heat_capacity_fits_ranges_array');
      // Tmin ≥ Tmax breaks both range rules; PostgreSQL reports the first by name.
      expectRule(await attempt(m, () => addFit(m, nasa7(f, undefined, 1000, 200))), 'heat_capacity_fits_ranges_valid');

      // Generated ranges: the database function and fitRangeProblems() agree on every one.
      await fc.assert(fc.asyncProperty(rangesArbitrary(), async ({ form, tMin, tMax, ranges }) => {
        const [row] = await m.query(`SELECT kx_fit_ranges_are_valid($1, $2::jsonb, $3, $4) AS ok`, [form, JSON.stringify(ranges), tMin, tMax]);
        expect(row.ok).withContext(JSON.stringify({ form, tMin, tMax, ranges })).toBe(fitRangeProblems(form, tMin, tMax, ranges).length === 0);
      }), { numRuns: 150 });

      expect((await attempt(m, `UPDATE heat_capacity_fits SET t_max_k = 5000 WHERE species_phase_id = $1`, [f.gas.id]))?.message).toContain('never changed in place');
    });
  });

  it('refuse bad identifiers: CAS check digit, InChIKey layout, DOI form, release label', async () => {
    await inRolledBackTransaction(async (m) => {
      const f = await catalogueFixture(m);
      const setSpecies = (column: string, value: unknown) => attempt(m, `UPDATE species SET ${column} = $2 WHERE id = $1`, [f.species.id, value]);
      // Xenon difluoride, the fixture's species: CAS RN 13709-36-9 (from memory; check digit
      // 6·1 + 3·2 + 9·3 + 0·4 + 7·5 + 3·6 + 1·7 = 99 → 9). The other forms are wrong on purpose.
      expect(await setSpecies('cas_rn', '13709-36-9')).toBeUndefined();
      expectRule(await setSpecies('cas_rn', '13709-36-8'), 'species_cas_rn_valid');
      expectRule(await setSpecies('cas_rn', '1370936-9'), 'species_cas_rn_valid');
      expectRule(await setSpecies('cas_rn', '013709-36-9'), 'species_cas_rn_valid');
      // Water's number is taken by the demo set's water when it is loaded, and unique anyway.
      await m.query(`INSERT INTO species (formula, hill_formula, composition, molar_mass, name, cas_rn) VALUES ('Xe', 'Xe', '{"Xe": 1}', 131.29, $1, '7440-63-3')`, [`xenon ${f.tag}`]);
      expectRule(await setSpecies('cas_rn', '7440-63-3'), 'species_cas_rn_unique');
      expectRule(await setSpecies('inchikey', 'XLYOFNOQVPJJNP-UHFFFAOYSA'), 'species_inchikey_format');
      expectRule(await setSpecies('composition', '{"c": 1}'), 'species_composition_valid');
      expectRule(await setSpecies('composition', '{"C": -1}'), 'species_composition_valid');

      const setDoi = (doi: string) => attempt(m, `UPDATE sources SET doi = $2 WHERE id = $1`, [f.source.id, doi]);
      expect(await setDoi('10.5555/kelvindex.fixture')).toBeUndefined();
      expectRule(await setDoi('doi:10.5555/x'), 'sources_doi_format');
      expectRule(await setDoi('10.55/short-prefix'), 'sources_doi_format');
      expectRule(await setDoi('10.5555/Upper-Case'), 'sources_doi_format');
      expectRule(await setDoi('10.5555/has space'), 'sources_doi_format');

      expectRule(await attempt(m, `INSERT INTO releases (label) VALUES ('2027-1')`), 'releases_label_format');
      expectRule(await attempt(m, `INSERT INTO releases (label) VALUES ('2027.01')`), 'releases_label_format');
      expectRule(await attempt(m, `INSERT INTO species_phases (species_id, phase) VALUES ($1, 'gas')`, [f.species.id]), 'species_phases_phase_known');
      expectRule(await attempt(m, `INSERT INTO species_phases (species_id, phase, polymorph) VALUES ($1, 'g', 'rhombic')`, [f.species.id]), 'species_phases_polymorph');
      expectRule(await attempt(m, `INSERT INTO species_phases (species_id, phase) VALUES ($1, 'g')`, [f.species.id]), 'species_phases_unique');
      expectRule(await attempt(m, `UPDATE users SET roles = '{reader,superuser}' WHERE id = $1`, [f.author.id]), 'users_roles_known');
      expectRule(await attempt(m, `INSERT INTO evidence_files (source_id, file_name, media_type, size_bytes, sha256, object_key) VALUES ($1, 'a.csv', 'text/csv', 3, 'abc', 'k')`, [f.source.id]), 'evidence_files_sha256_format');
    });
  });

  it('enforce the four-eyes rule, the frozen identity of species with data, and optimistic-locking versions', async () => {
    await inRolledBackTransaction(async (m: EntityManager) => {
      const f = await catalogueFixture(m);
      const [proposal] = await m.query(`INSERT INTO proposals (title, author_id) VALUES ('Fixture', $1) RETURNING id, version`, [f.author.id]);
      expectRule(await attempt(m, `INSERT INTO proposal_reviews (proposal_id, reviewer_id, decision) VALUES ($1, $2, 'approve')`, [proposal.id, f.author.id]), 'proposal_reviews_four_eyes');
      expect(await attempt(m, `INSERT INTO proposal_reviews (proposal_id, reviewer_id, decision) VALUES ($1, $2, 'approve')`, [proposal.id, f.reviewer.id])).toBeUndefined();
      expectRule(await attempt(m, `INSERT INTO proposal_items (proposal_id, position, kind) VALUES ($1, 1, 'add_value')`, [proposal.id]), 'proposal_items_source_required');

      // Every UPDATE bumps the version, so "WHERE version = <read>" detects a concurrent change.
      await m.query(`UPDATE proposals SET state = 'submitted', submitted_at = now() WHERE id = $1 AND version = $2`, [proposal.id, proposal.version]);
      const [stale] = await m.query(`WITH u AS (UPDATE proposals SET state = 'withdrawn' WHERE id = $1 AND version = $2 RETURNING 1) SELECT count(*)::int AS n FROM u`, [proposal.id, proposal.version]);
      expect(stale.n).toBe(0);
      const [now] = await m.query(`SELECT version, state FROM proposals WHERE id = $1`, [proposal.id]);
      expect(now).toEqual({ version: proposal.version + 1, state: 'submitted' });

      // Names may change; once values exist, what the species is may not.
      expect(await attempt(m, `UPDATE species SET name = $2 WHERE id = $1`, [f.species.id, `renamed ${f.tag}`])).toBeUndefined();
      await f.value();
      expectRule(await attempt(m, `UPDATE species SET composition = '{"F": 4, "Xe": 1}', hill_formula = 'F4Xe' WHERE id = $1`, [f.species.id]), 'species_identity_frozen');
      expectRule(await attempt(m, `UPDATE species_phases SET phase = 'l' WHERE id = $1`, [f.gas.id]), 'species_phases_identity_frozen');
    });
  });
});

/** Random fit descriptions, mostly near-valid so both verdicts occur. */
function rangesArbitrary() {
  const form = fc.constantFrom('constant', 'shomate', 'nasa7', 'nasa9', 'tabulated') as fc.Arbitrary<HeatCapacityFit['form']>;
  const counts: Record<string, number> = { constant: 1, shomate: 8, nasa7: 7, nasa9: 9 };
  return fc.record({
    form,
    breaks: fc.uniqueArray(fc.integer({ min: 100, max: 6000 }), { minLength: 2, maxLength: 4 }).map((a) => a.sort((x, y) => x - y)),
    countDelta: fc.constantFrom(0, 0, 0, 1, -1),
    gap: fc.constantFrom(0, 0, 0, 5),
    pointCount: fc.integer({ min: 1, max: 4 }),
  }).map(({ form: f, breaks, countDelta, gap, pointCount }) => {
    const ranges = breaks.slice(0, -1).map((lo, i) => {
      const start = i === 1 ? lo + gap : lo;
      const hi = breaks[i + 1];
      if (f === 'tabulated') {
        const points = Array.from({ length: pointCount }, (_, k) => [start + ((hi - start) * k) / Math.max(1, pointCount - 1), 20 + k]);
        return { tMin: start, tMax: hi, points };
      }
      return { tMin: start, tMax: hi, coefficients: Array.from({ length: Math.max(0, counts[f] + countDelta) }, (_, k) => k + 0.5) };
    });
    return { form: f, tMin: breaks[0], tMax: breaks[breaks.length - 1], ranges };
  });
}
