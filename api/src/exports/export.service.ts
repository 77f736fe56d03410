import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { PoolClient } from 'pg';
import QueryStream from 'pg-query-stream';
import type { DataSource } from 'typeorm';
import type { ResolvedRelease } from '../releases/release-resolution';
import { speciesConditions, type SpeciesFilter } from '../species/species-filter';
import { SOURCE_COLUMNS, sourceRef, type SourceRef } from '../species/species.service';
import { APP_VERSION } from '../version';
import { citedSourceJoin } from '../sources/cited-source';

export interface ExportOptions {
  filter: SpeciesFilter;
  /** only the recommended member of each species phase and quantity */
  recommendedOnly: boolean;
}

/** One exported row: a value or a fit version, with its species; column names as in the CSV. */
export interface ExportRow {
  record_kind: 'value' | 'fit';
  species_id: string;
  formula: string;
  hill_formula: string;
  name: string;
  charge: number;
  molar_mass_g_per_mol: number;
  cas_rn: string | null;
  inchikey: string | null;
  phase: string;
  polymorph: string | null;
  quantity: string;
  symbol: string;
  transition: string | null;
  recommended: boolean;
  value: number | null;
  uncertainty: number | null;
  uncertainty_kind: string | null;
  coverage_factor: number | null;
  unit: string;
  temperature_K: number | null;
  pressure_Pa: number;
  method: string;
  method_detail: string | null;
  fit_form: string | null;
  t_min_K: number | null;
  t_max_K: number | null;
  fit_ranges: unknown[] | null;
  source_key: string;
  doi: string | null;
  version_id: string;
  lineage_id: string;
  version_no: number;
}

/** The CSV columns, in order (documented in README). */
export const EXPORT_COLUMNS: (keyof ExportRow)[] = [
  'record_kind', 'species_id', 'formula', 'hill_formula', 'name', 'charge', 'molar_mass_g_per_mol', 'cas_rn', 'inchikey',
  'phase', 'polymorph', 'quantity', 'symbol', 'transition', 'recommended', 'value', 'uncertainty', 'uncertainty_kind',
  'coverage_factor', 'unit', 'temperature_K', 'pressure_Pa', 'method', 'method_detail', 'fit_form', 't_min_K', 't_max_K',
  'fit_ranges', 'source_key', 'doi', 'version_id', 'lineage_id', 'version_no',
];

/** A recommended NASA-7 fit with what its 80-column record needs. */
export interface Nasa7Row {
  species_id: string;
  formula: string;
  name: string;
  composition: Record<string, number>;
  charge: number;
  phase: string;
  polymorph: string | null;
  fit_id: string;
  ranges: Array<{ tMin: number; tMax: number; coefficients?: number[] }>;
  pressure_pa: number;
  source_key: string;
}

const PHASE_ORDER = `array_position(ARRAY['cr','am','l','g','aq','aq,inf']::text[], sp.phase)`;

/** A cursor over an export query; `done()` gives its connection back (call it once the stream ends). */
export interface ExportCursor {
  stream: Readable;
  done(): Promise<void>;
}

/**
 * Exports read straight from a database cursor (pg-query-stream), a batch of rows at a time, so
 * memory stays flat however large the release.
 */
export class ExportService {
  constructor(private readonly dataSource: DataSource) {}

  /** FROM … WHERE for the members of the species the filters select, in release `$1`. */
  private membersOf(release: ResolvedRelease, options: ExportOptions, kind: 'all' | 'nasa7'): { sql: string; params: unknown[] } {
    const params: unknown[] = [release.id];
    const { where } = speciesConditions(options.filter, params, '$1');
    const memberConditions = ['m.release_id = $1'];
    const p = (value: unknown) => `$${params.push(value)}`;
    if (options.filter.phase) {
      memberConditions.push(`sp.phase = ${p(options.filter.phase.phase)}`);
      if (options.filter.phase.polymorph !== null) memberConditions.push(`sp.polymorph = ${p(options.filter.phase.polymorph)}`);
    }
    if (kind === 'nasa7') {
      memberConditions.push(`m.member_kind = 'fit'`, 'm.is_recommended', `f.form = 'nasa7'`);
    } else {
      if (options.filter.quantity) memberConditions.push(`m.quantity = ${p(options.filter.quantity)}`);
      if (options.recommendedOnly) memberConditions.push('m.is_recommended');
    }
    return {
      sql: `FROM species s
            JOIN species_phases sp ON sp.species_id = s.id
            JOIN release_members m ON m.species_phase_id = sp.id
            LEFT JOIN thermo_values v ON v.id = m.value_id
            LEFT JOIN heat_capacity_fits f ON f.id = m.fit_id
            ${citedSourceJoin('coalesce(v.source_id, f.source_id)')}
           WHERE ${where} AND ${memberConditions.join(' AND ')}`,
      params,
    };
  }

  /** The sources every exported row cites, for the export's header. */
  async sources(release: ResolvedRelease, options: ExportOptions, kind: 'all' | 'nasa7'): Promise<SourceRef[]> {
    const { sql, params } = this.membersOf(release, options, kind);
    const rows = await this.dataSource.query(
      `SELECT ${SOURCE_COLUMNS} FROM sources src WHERE src.id IN (SELECT src.id ${sql}) ORDER BY src.short_key`,
      params,
    );
    return rows.map(sourceRef);
  }

  /**
   * A weak validator for an export: the release, the query, the code version and the last change
   * to the mutable records an export shows (species names and identifiers, source records).
   */
  async etag(release: ResolvedRelease, query: string): Promise<string> {
    const [stamp] = await this.dataSource.query(`SELECT (SELECT max(updated_at) FROM species) AS species, (SELECT max(updated_at) FROM sources) AS sources`);
    const hash = createHash('sha256')
      .update(JSON.stringify([release.id, release.status, release.publishedAt, query, APP_VERSION, stamp.species, stamp.sources]))
      .digest('base64url')
      .slice(0, 27);
    return `W/"x-${hash}"`;
  }

  /** Values and fits of the selected species, ordered by species, phase, quantity, recommended first. */
  rows(release: ResolvedRelease, options: ExportOptions): Promise<ExportCursor> {
    const { sql, params } = this.rowsQuery(release, options);
    return this.cursor(sql, params);
  }

  /** The SQL of `rows` (the benchmark compares it with PostgreSQL's own COPY of the same rows). */
  rowsQuery(release: ResolvedRelease, options: ExportOptions): { sql: string; params: unknown[] } {
    const { sql, params } = this.membersOf(release, options, 'all');
    return {
      params,
      sql: `SELECT m.member_kind AS record_kind, s.id AS species_id, s.formula, s.hill_formula, s.name, s.charge, s.molar_mass AS molar_mass_g_per_mol,
              s.cas_rn, s.inchikey, sp.phase, sp.polymorph, m.quantity,
              CASE m.quantity WHEN 'dfH' THEN 'ΔfH°' WHEN 'S' THEN 'S°' WHEN 'Cp' THEN 'Cp°' WHEN 'dfG' THEN 'ΔfG°' ELSE 'ΔtrsH' END AS symbol,
              m.transition_kind AS transition, m.is_recommended AS recommended,
              v.value_si AS value, v.uncertainty_si AS uncertainty, v.uncertainty_kind, v.coverage_factor,
              CASE WHEN m.quantity IN ('S', 'Cp') THEN 'J/(mol·K)' ELSE 'J/mol' END AS unit,
              v.temperature_k AS "temperature_K", coalesce(v.pressure_pa, f.pressure_pa) AS "pressure_Pa",
              coalesce(v.method, f.method) AS method, coalesce(v.level_of_theory, f.level_of_theory) AS method_detail,
              f.form AS fit_form, f.t_min_k AS "t_min_K", f.t_max_k AS "t_max_K", f.ranges AS fit_ranges,
              src.short_key AS source_key, src.doi, coalesce(v.id, f.id) AS version_id,
              m.lineage_id, coalesce(v.version_no, f.version_no) AS version_no
         ${sql}
        ORDER BY s.hill_formula, lower(s.name), s.id, ${PHASE_ORDER}, sp.polymorph NULLS FIRST, m.member_kind DESC, m.quantity,
                 m.transition_kind NULLS FIRST, m.is_recommended DESC, src.short_key, m.lineage_id`,
    };
  }

  /** The recommended NASA-7 fits of the selected species. */
  nasa7(release: ResolvedRelease, options: ExportOptions): Promise<ExportCursor> {
    const { sql, params } = this.membersOf(release, options, 'nasa7');
    return this.cursor(
      `SELECT s.id AS species_id, s.formula, s.name, s.composition, s.charge, sp.phase, sp.polymorph, f.id AS fit_id, f.ranges,
              f.pressure_pa, src.short_key AS source_key
         ${sql}
        ORDER BY s.hill_formula, lower(s.name), s.id, ${PHASE_ORDER}, sp.polymorph NULLS FIRST`,
      params,
    );
  }

  private async cursor(sql: string, params: unknown[]): Promise<ExportCursor> {
    // A replica when one is configured: an export is a long read.
    const runner = this.dataSource.createQueryRunner('slave');
    const client = (await runner.connect()) as PoolClient;
    const stream = client.query(new QueryStream(sql, params, { batchSize: 1000, highWaterMark: 1000 }));
    let released = false;
    return {
      stream,
      done: async () => {
        if (released) return;
        released = true;
        await runner.release();
      },
    };
  }
}
