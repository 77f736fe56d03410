import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { PoolClient } from 'pg';
import { to as copyTo } from 'pg-copy-streams';
import type { DataSource } from 'typeorm';
import type { ResolvedRelease } from '../releases/release-resolution';
import { releaseMembership, speciesMatch, type SpeciesFilter } from '../species/species-filter';
import { SOURCE_COLUMNS, sourceRef, type SourceRef } from '../species/species.service';
import { APP_VERSION } from '../version';
import { citedSourceJoin } from '../sources/cited-source';
import { inlineParameters } from '../shared/sql-literals';
import type { ExportRow } from './export-columns';
import { PortalStream } from './portal-stream';

export interface ExportOptions {
  filter: SpeciesFilter;
  /** only the recommended member of each species phase and quantity */
  recommendedOnly: boolean;
}

export { EXPORT_COLUMNS, type ExportRow } from './export-columns';

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

/** A cursor over an export query; `done()` closes it and gives its connection back (call it once, at the end). */
export interface ExportCursor {
  stream: Readable;
  done(): Promise<void>;
}

/** Rows an export's stream holds before it pauses the database's socket. */
const BUFFERED_ROWS = 200;
/** Header source lists kept (published releases only; one per release, format kind and filters). */
const MAX_CACHED_SOURCE_LISTS = 200;

/**
 * Exports read straight from the database as the rows come (PortalStream), so memory stays flat
 * however large the release.
 */
export class ExportService {
  /** The header's sources of exports of published releases, by release, kind, filters and the last change to species and sources. */
  private readonly publishedSources = new Map<string, Promise<SourceRef[]>>();

  constructor(private readonly dataSource: DataSource) {}

  /** FROM … WHERE for the members of the species the filters select, in release `$1`. */
  private membersOf(release: ResolvedRelease, options: ExportOptions, kind: 'all' | 'nasa7'): { sql: string; params: unknown[] } {
    const params: unknown[] = [release.id];
    // The joined member m belongs to release $1 and carries the phase (and quantity) asked for, so
    // the species holds data there: no per-species membership test (EXISTS) as a search needs. A
    // NASA-7 export's members are fits, so a quantity filter still asks which species hold one.
    const { conditions } = speciesMatch(options.filter, params);
    if (kind === 'nasa7' && options.filter.quantity) conditions.push(releaseMembership(options.filter, params, '$1'));
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
           WHERE ${[...conditions, ...memberConditions].join(' AND ')}`,
      params,
    };
  }

  /**
   * The sources every exported row cites, for the export's header. For a published release the
   * list is computed once (its members never change) and kept while no species or source record
   * changes (names and merges decide which species match and which source a row shows).
   */
  async sources(release: ResolvedRelease, options: ExportOptions, kind: 'all' | 'nasa7'): Promise<SourceRef[]> {
    if (release.status !== 'published') return this.citedSources(release, options, kind);
    const key = JSON.stringify([release.id, kind, options, await this.lastChange()]);
    let sources = this.publishedSources.get(key);
    if (!sources) {
      if (this.publishedSources.size >= MAX_CACHED_SOURCE_LISTS) this.publishedSources.delete(this.publishedSources.keys().next().value!);
      sources = this.citedSources(release, options, kind);
      this.publishedSources.set(key, sources);
      sources.catch(() => this.publishedSources.delete(key));
    }
    return sources;
  }

  /**
   * The sources the selected members cite. For a whole release, one probe per source instead of a
   * join of all its members: does a value or fit of the release cite it (found through the
   * source_id indexes)? A fraction of a second where the join takes seconds, while the export's own
   * query sorts on the other core. (With filters, a source many members cite but none selected ones
   * would be probed through all its members: there the join is the cheaper.)
   */
  private async citedSources(release: ResolvedRelease, options: ExportOptions, kind: 'all' | 'nasa7'): Promise<SourceRef[]> {
    const { filter } = options;
    const wholeRelease = kind === 'all' && !options.recommendedOnly && !filter.phase && !filter.quantity && speciesMatch(filter, []).conditions.length === 0;
    const { sql, params } = this.membersOf(release, options, kind);
    const cited = wholeRelease
      ? `SELECT coalesce(c.merged_into_id, c.id) FROM sources c
          WHERE EXISTS (SELECT 1 FROM thermo_values v JOIN release_members m ON m.value_id = v.id WHERE v.source_id = c.id AND m.release_id = $1)
             OR EXISTS (SELECT 1 FROM heat_capacity_fits f JOIN release_members m ON m.fit_id = f.id WHERE f.source_id = c.id AND m.release_id = $1)`
      : `SELECT src.id ${sql}`;
    const rows = await this.dataSource.query(`SELECT ${SOURCE_COLUMNS} FROM sources src WHERE src.id IN (${cited}) ORDER BY src.short_key`, params);
    return rows.map(sourceRef);
  }

  /** The last change to the mutable records an export shows (species names and identifiers, source records). */
  private async lastChange(): Promise<{ species: Date | null; sources: Date | null }> {
    const [stamp] = await this.dataSource.query(`SELECT (SELECT max(updated_at) FROM species) AS species, (SELECT max(updated_at) FROM sources) AS sources`);
    return stamp;
  }

  /** A weak validator for an export: the release, the query, the code version and the last change to species and sources. */
  async etag(release: ResolvedRelease, query: string): Promise<string> {
    const stamp = await this.lastChange();
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

  /**
   * The rows of `rows` as PostgreSQL's COPY text (csvStages reads it), with the type of each
   * column. COPY takes no parameters, so they are written into the statement as literals, each
   * escaped by pg's escapeLiteral.
   */
  async csvCopy(release: ResolvedRelease, options: ExportOptions): Promise<ExportCursor & { columnTypes: number[] }> {
    const { sql, params } = this.rowsQuery(release, options);
    // A replica when one is configured: an export is a long read.
    const runner = this.dataSource.createQueryRunner('slave');
    const client = (await runner.connect()) as PoolClient;
    try {
      // The columns' types, from the statement described (LIMIT 0: planned, nothing sorted).
      const { fields } = await client.query({ text: `SELECT * FROM (${sql}) AS export LIMIT 0`, values: params });
      const stream = client.query(copyTo(`COPY (${inlineParameters(sql, params, (text) => client.escapeLiteral(text))}) TO STDOUT`));
      let ended = false;
      stream.on('end', () => (ended = true));
      let released = false;
      return {
        stream,
        columnTypes: fields.map((f) => f.dataTypeID),
        done: async () => {
          if (released) return;
          released = true;
          if (!stream.destroyed) stream.destroy();
          // A COPY cut short leaves the connection mid-COPY: end it (PostgreSQL stops the COPY with it).
          if (!ended) await client.end().catch(() => undefined);
          await runner.release();
        },
      };
    } catch (error) {
      await runner.release();
      throw error;
    }
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
    const stream = client.query(new PortalStream(sql, params, { bufferedRows: BUFFERED_ROWS }));
    let released = false;
    return {
      stream,
      done: async () => {
        if (released) return;
        released = true;
        if (!stream.destroyed) stream.destroy();
        // Rows may still be on their way: end the connection (PostgreSQL stops the query with it).
        if (stream.abandoned) await client.end();
        await runner.release();
      },
    };
  }
}
