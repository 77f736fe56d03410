/**
 * `npm run bench:data`: generates the benchmark data set into the bench cluster (bench-cluster.ts),
 * or does nothing when the database already holds it. Deterministic: the same seed and size give
 * the same rows, ids included.
 *
 *   KELVINDEX_BENCH_SPECIES  number of species (default 100 000)
 *   KELVINDEX_BENCH_SEED     seed text (default kelvindex-bench-1)
 *   KELVINDEX_BENCH_REGENERATE=1  throw the database away and generate again
 *
 * Load path: PostgreSQL's COPY FROM STDIN (pg-copy-streams), one transaction per table, with every
 * constraint and trigger of the schema active (version chains, published-release guards, the
 * one-recommended-member check on publication).
 */
import 'reflect-metadata';
import { Client } from 'pg';
import { loadConfig } from '../src/config';
import { prepareDatabase } from '../tools/prepare-database';
import { recreateDatabase, readMarker, startBenchCluster, writeMarker, type BenchCluster, type BenchMarker } from './bench-cluster';
import { withIndexesRebuilt } from './bulk-load';
import { copyLine, copyRows } from '../src/shared/copy-rows';
import { benchId } from './seeded-random';
import { generateCatalogue, type SpeciesPlan } from './synthetic-species';
import { nasa7Fit, phaseTruths, referenceEntropies } from './synthetic-thermo';
import { membership, RELEASES, speciesRecords, type Membership, type SpeciesRecords } from './synthetic-records';
import { SOURCES } from './synthetic-sources';

/** Bump when the generator's output changes: a database made by another version is regenerated. */
export const GENERATOR_VERSION = 1;

export interface BenchDataOptions {
  species: number;
  seed: string;
  regenerate: boolean;
}

export function benchDataOptions(env: NodeJS.ProcessEnv = process.env): BenchDataOptions {
  return {
    species: Number(env.KELVINDEX_BENCH_SPECIES ?? 100_000),
    seed: env.KELVINDEX_BENCH_SEED ?? 'kelvindex-bench-1',
    regenerate: env.KELVINDEX_BENCH_REGENERATE === '1',
  };
}

/** Migrates the bench database and makes sure it holds the data set; returns its marker. */
export async function ensureBenchData(bench: BenchCluster, options: BenchDataOptions): Promise<BenchMarker> {
  const marker = await readMarker(bench.url);
  const current = marker && marker.generator === GENERATOR_VERSION && marker.seed === options.seed && marker.species === options.species;
  if (current && !options.regenerate) {
    await prepareDatabase(loadConfig({ DATABASE_URL: bench.url }), { demo: false });
    console.log(`The bench database already holds the data set (${options.species} species, seed ${options.seed}, generated ${marker.generatedAt}); nothing to do.`);
    return marker;
  }
  if (marker || (await hasSpecies(bench.url))) {
    console.log(marker ? 'The bench database holds another data set; regenerating.' : 'The bench database holds a partial load; regenerating.');
  }
  await recreateDatabase(bench);
  await prepareDatabase(loadConfig({ DATABASE_URL: bench.url }), { demo: false });
  return generate(bench.url, options);
}

async function hasSpecies(url: string): Promise<boolean> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    const { rows } = await client.query(`SELECT to_regclass('species') IS NOT NULL AND EXISTS (SELECT 1 FROM species) AS present`);
    return rows[0].present === true;
  } catch {
    return false;
  } finally {
    await client.end();
  }
}

const SPECIES_COLUMNS = ['id', 'formula', 'hill_formula', 'charge', 'composition', 'molar_mass', 'name', 'synonyms', 'inchi', 'inchikey', 'cas_rn', 'notes', 'created_at', 'updated_at'];
const PHASE_COLUMNS = ['id', 'species_id', 'phase', 'polymorph', 'is_reference_state', 'created_at'];
const VALUE_COLUMNS = ['id', 'lineage_id', 'version_no', 'supersedes_id', 'species_phase_id', 'quantity', 'transition_kind', 'value_si', 'uncertainty_si',
  'uncertainty_kind', 'coverage_factor', 'temperature_k', 'pressure_pa', 'method', 'level_of_theory', 'source_id', 'source_locator', 'entered_value',
  'entered_unit', 'is_retired', 'retired_reason', 'notes', 'created_at'];
const FIT_COLUMNS = ['id', 'lineage_id', 'version_no', 'supersedes_id', 'species_phase_id', 'form', 't_min_k', 't_max_k', 'ranges', 'pressure_pa', 'method',
  'level_of_theory', 'source_id', 'source_locator', 'notes', 'created_at'];
const MEMBER_COLUMNS = ['id', 'release_id', 'member_kind', 'value_id', 'fit_id', 'lineage_id', 'species_phase_id', 'quantity', 'transition_kind', 'is_recommended', 'created_at'];

const SPECIES_NOTE = 'Invented benchmark record (api/bench/generate-data.ts): plausible, not real data.';
const sourceId = (key: string) => benchId('source', key);
const releaseId = (r: number) => benchId('release', RELEASES[r].label);
const daysBefore = (iso: string, days: number) => new Date(Date.parse(iso) - days * 86_400_000).toISOString();

interface TableTiming {
  table: string;
  rows: number;
  seconds: number;
}

async function generate(url: string, options: BenchDataOptions): Promise<BenchMarker> {
  const started = performance.now();
  const timings: TableTiming[] = [];
  const client = new Client({ connectionString: url });
  await client.connect();
  // The load is one job: losing its last transactions in a crash only means generating again.
  await client.query(`SET synchronous_commit = off`);
  await client.query(`SET maintenance_work_mem = '512MB'`);

  const report = (what: string, rows: number, seconds: number) =>
    console.log(`  ${what.padEnd(38)} ${String(rows).padStart(9)} rows  ${seconds.toFixed(1).padStart(6)} s  ${Math.round(rows / seconds).toLocaleString('en').padStart(9)} rows/s`);
  /** One transaction per table; big tables get their indexes and foreign keys rebuilt after the COPY. */
  const step = async (table: string, work: (part: (what: string, load: () => Promise<number>) => Promise<number>) => Promise<number>, rebuild = true) => {
    const t0 = performance.now();
    await client.query('BEGIN');
    const part = async (what: string, load: () => Promise<number>) => {
      const p0 = performance.now();
      const rows = await load();
      report(`  ${what}`, rows, (performance.now() - p0) / 1000);
      return rows;
    };
    let rebuildSeconds = 0;
    let rows: number;
    if (rebuild) {
      const loaded = await withIndexesRebuilt(client, table, () => work(part));
      rows = loaded.result;
      rebuildSeconds = loaded.rebuildSeconds;
    } else {
      rows = await work(part);
    }
    await client.query('COMMIT');
    const seconds = (performance.now() - t0) / 1000;
    timings.push({ table, rows, seconds });
    report(table + (rebuild ? ` (indexes, FKs ${rebuildSeconds.toFixed(1)} s)` : ''), rows, seconds);
  };

  try {
    console.log(`Generating ${options.species.toLocaleString('en')} species (seed ${options.seed})…`);
    let t0 = performance.now();
    const catalogue = generateCatalogue(options.species, options.seed);
    const refs = referenceEntropies(options.seed);
    console.log(`  catalogue in memory                      ${((performance.now() - t0) / 1000).toFixed(1)} s`);

    await step('sources', async () => {
      for (const s of SOURCES) {
        const csl = {
          type: s.type, title: s.title, author: s.authors.map(([family, given]) => ({ family, given })), issued: { 'date-parts': [[s.year]] },
          ...(s.container ? { 'container-title': s.container } : {}), ...(s.doi ? { DOI: s.doi } : {}),
        };
        await client.query(
          `INSERT INTO sources (id, short_key, title, year, doi, csl, notes, created_at, updated_at) VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $8)`,
          [sourceId(s.key), s.key, s.title, s.year, s.doi, JSON.stringify(csl), 'Invented source of the benchmark data set; every value citing it is generated.', '2023-11-01T09:00:00Z'],
        );
      }
      return SOURCES.length;
    }, false);
    await step('species', () => copyRows(client, 'species', SPECIES_COLUMNS, speciesLines(catalogue)));
    await step('species_phases', () => copyRows(client, 'species_phases', PHASE_COLUMNS, phaseLines(catalogue)));
    await step('releases', async () => {
      for (let r = 0; r < RELEASES.length; r++) {
        await client.query(
          `INSERT INTO releases (id, label, notes, created_at, updated_at) VALUES ($1, $2, $3, $4, $4)`,
          [releaseId(r), RELEASES[r].label, `Benchmark release ${RELEASES[r].label} (invented data).`, RELEASES[r].createdAt],
        );
      }
      return RELEASES.length;
    }, false);

    // Values: first versions stream straight from the generator; later versions (a few per cent)
    // are kept and loaded afterwards, since the version-chain trigger needs the version they supersede.
    const records: SpeciesRecords[] = new Array(catalogue.length);
    await step('thermo_values', async (part) => {
      const laterValues: string[][] = [];
      let rows = await part('first versions (COPY)', () =>
        copyRows(client, 'thermo_values', VALUE_COLUMNS, valueLines(catalogue, records, laterValues, refs, options.seed)));
      for (let v = 2; v < laterValues.length; v++) {
        if (laterValues[v]?.length) rows += await part(`version ${v} (COPY)`, () => copyRows(client, 'thermo_values', VALUE_COLUMNS, laterValues[v]));
      }
      return rows;
    });
    await step('heat_capacity_fits', async (part) => {
      const laterFits: string[][] = [];
      let rows = await part('NASA-7 fits, first versions (COPY)', () => copyRows(client, 'heat_capacity_fits', FIT_COLUMNS, fitLines(records, laterFits), 20_000));
      for (let v = 2; v < laterFits.length; v++) {
        if (laterFits[v]?.length) rows += await part(`version ${v} (COPY)`, () => copyRows(client, 'heat_capacity_fits', FIT_COLUMNS, laterFits[v]));
      }
      return rows;
    });
    await step('release_members', async (part) => {
      let rows = 0;
      for (let r = 0; r < RELEASES.length; r++) {
        const changes = { added: 0, revised: 0, retired: 0, removed: 0, recommendation: 0 };
        const members = await part(`${RELEASES[r].label} (COPY)`, () => copyRows(client, 'release_members', MEMBER_COLUMNS, memberLines(records, r, changes)));
        rows += members;
        const publishedAt = RELEASES[r].publishedAt;
        if (publishedAt) {
          await part(`publish ${RELEASES[r].label} (members checked)`, async () => {
            const changeLog = {
              release: RELEASES[r].label, comparedWith: r > 0 ? RELEASES[r - 1].label : null, generatedAt: publishedAt, summary: changes, species: [], changes: [],
              note: 'Benchmark data set: the per-species change list is left out (compare the releases with the diff endpoint).',
            };
            // The release trigger refuses this unless every group has exactly one recommended member.
            await client.query(
              `UPDATE releases SET status = 'published', published_at = $2, updated_at = $2, change_log = $3 WHERE id = $1`,
              [releaseId(r), publishedAt, JSON.stringify(changeLog)],
            );
            return members;
          });
        }
      }
      return rows;
    });
    const loadSeconds = (performance.now() - started) / 1000;

    const t1 = performance.now();
    await client.query('VACUUM (ANALYZE)');
    console.log(`  VACUUM (ANALYZE)                         ${((performance.now() - t1) / 1000).toFixed(1)} s`);

    const rows: Record<string, number> = {};
    for (const table of ['species', 'species_phases', 'sources', 'thermo_values', 'heat_capacity_fits', 'releases', 'release_members']) {
      rows[table] = Number((await client.query(`SELECT count(*) AS n FROM ${table}`)).rows[0].n);
    }
    const total = Object.values(rows).reduce((a, n) => a + n, 0);
    const marker: BenchMarker = {
      generator: GENERATOR_VERSION,
      seed: options.seed,
      species: options.species,
      generatedAt: new Date().toISOString(),
      rows,
      loadSeconds: Math.round(loadSeconds * 10) / 10,
      rowsPerSecond: Math.round(total / loadSeconds),
      tables: timings.map((t) => ({ ...t, seconds: Math.round(t.seconds * 10) / 10 })),
    };
    await writeMarker(client, marker);
    console.log(`Generated and loaded ${total.toLocaleString('en')} rows in ${loadSeconds.toFixed(1)} s (${marker.rowsPerSecond.toLocaleString('en')} rows/s, COPY with all constraints and triggers), then VACUUM ANALYZE.`);
    return marker;
  } catch (error) {
    await client.query('ROLLBACK').catch(() => undefined);
    throw error;
  } finally {
    await client.end();
  }
}

function* speciesLines(catalogue: SpeciesPlan[]): Generator<string> {
  for (const s of catalogue) {
    const created = daysBefore(RELEASES[s.introRelease].createdAt, 20 + (s.index % 300));
    yield copyLine([s.id, s.formula, s.hill, s.charge, s.composition, s.molarMass, s.name, s.synonyms, s.inchi, s.inchikey, s.casRn, SPECIES_NOTE, created, created]);
  }
}

function* phaseLines(catalogue: SpeciesPlan[]): Generator<string> {
  for (const s of catalogue) {
    const created = daysBefore(RELEASES[s.introRelease].createdAt, 20 + (s.index % 300));
    for (const p of s.phases) yield copyLine([p.id, s.id, p.phase, p.polymorph, p.isReferenceState, created]);
  }
}

/**
 * First versions of every value, species by species; later versions go to `later[versionNo]`.
 * Fills `records` (readings dropped once written) for the fit and membership passes.
 */
function* valueLines(catalogue: SpeciesPlan[], records: SpeciesRecords[], later: string[][], refs: ReturnType<typeof referenceEntropies>, seed: string): Generator<string> {
  for (const species of catalogue) {
    const parent = species.hints.parentIndex === undefined ? undefined : catalogue[species.hints.parentIndex];
    const truths = phaseTruths(species, seed, refs, parent);
    const rec = speciesRecords(species, truths, seed);
    records[species.index] = rec;
    for (const lineage of rec.values) {
      for (const v of lineage.versions) {
        const r = v.reading;
        const line = copyLine([
          v.id, lineage.lineageId, v.versionNo, v.supersedesId, lineage.phase.id, lineage.quantity, lineage.transitionKind, r.valueSi, r.uncertaintySi,
          r.uncertaintyKind, r.coverageFactor, 298.15, lineage.source.pressure, lineage.source.method, lineage.source.levelOfTheory ?? null,
          sourceId(lineage.source.key), `entry ${species.index + 1}`, r.enteredValue, r.enteredUnit, v.retiredReason !== null, v.retiredReason, v.notes, v.createdAt,
        ]);
        if (v.versionNo === 1) yield line;
        else (later[v.versionNo] ??= []).push(line);
      }
      for (const v of lineage.versions) (v as { reading: unknown }).reading = null;
    }
  }
}

/** NASA-7 fits (200–1000–Tmax K, continuous at 1000 K) of every gas and element reference state. */
function* fitLines(records: SpeciesRecords[], later: string[][]): Generator<string> {
  for (const rec of records) {
    for (const lineage of rec.fits) {
      for (const v of lineage.versions) {
        const fit = nasa7Fit(lineage.heatCapacity, lineage.tMax, v.formationEnthalpy, v.entropy, v.cpScale);
        const ranges = fit.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax, coefficients: [...r.coefficients] }));
        const line = copyLine([
          v.id, lineage.lineageId, v.versionNo, v.supersedesId, lineage.phase.id, 'nasa7', ranges[0].tMin, ranges[ranges.length - 1].tMax, JSON.stringify(ranges),
          100000, lineage.source.method, lineage.source.levelOfTheory ?? null, sourceId(lineage.source.key), null, v.notes, v.createdAt,
        ]);
        if (v.versionNo === 1) yield line;
        else (later[v.versionNo] ??= []).push(line);
      }
      // The Cp model is not needed any more.
      (lineage as { heatCapacity: unknown }).heatCapacity = null;
    }
  }
}

/** Release r's members; counts what changed against release r − 1 on the way (for its change log). */
function* memberLines(records: SpeciesRecords[], r: number, changes: Record<'added' | 'revised' | 'retired' | 'removed' | 'recommendation', number>): Generator<string> {
  const created = daysBefore(RELEASES[r].publishedAt ?? '2026-02-01T12:00:00.000Z', 3);
  for (const rec of records) {
    const now = membership(rec, r);
    const before = r > 0 ? new Map(membership(rec, r - 1).map((m) => [m.lineageId, m])) : new Map<string, Membership>();
    for (const m of now) {
      const previous = before.get(m.lineageId);
      if (!previous) changes.added++;
      else if (previous.versionId !== m.versionId) changes.revised++;
      else if (previous.recommended !== m.recommended) changes.recommendation++;
      before.delete(m.lineageId);
      yield copyLine([
        benchId('member', `${RELEASES[r].label}/${m.lineageId}`), releaseId(r), m.kind, m.kind === 'value' ? m.versionId : null, m.kind === 'fit' ? m.versionId : null,
        m.lineageId, m.phaseId, m.quantity, m.transitionKind, m.recommended, created,
      ]);
    }
    changes.retired += before.size;
  }
}

async function main(): Promise<void> {
  const options = benchDataOptions();
  const bench = await startBenchCluster();
  try {
    await ensureBenchData(bench, options);
  } finally {
    await bench.stop();
  }
}

if (require.main === module) {
  main().catch((error: Error) => {
    console.error(error.stack ?? error.message);
    process.exit(1);
  });
}
