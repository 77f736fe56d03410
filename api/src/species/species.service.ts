import type { DataSource } from 'typeorm';
import type { ResolvedRelease } from '../releases/release-resolution';
import { NotFoundError } from '../shared/errors';
import { formatCitation } from '../sources/citation';
import { QUANTITY_SYMBOLS, SI_UNITS, type FitForm, type Method, type Quantity, type TransitionKind, type UncertaintyKind } from '../values/value-vocabulary';
import type { PhaseCode } from './phase-code';
import { speciesConditions, speciesOrder, type SpeciesFilter, type SpeciesSort } from './species-filter';
import { citedSourceJoin } from '../sources/cited-source';

export interface PhaseRef {
  phase: PhaseCode;
  polymorph: string | null;
}

export interface SpeciesSummary {
  id: string;
  formula: string;
  hillFormula: string;
  name: string;
  charge: number;
  molarMass: number;
  phases: PhaseRef[];
}

export interface SourceRef {
  id: string;
  key: string;
  citation: string;
  doi: string | null;
}

export interface ValueView {
  id: string;
  lineageId: string;
  versionNo: number;
  value: number;
  uncertainty: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  unit: string;
  temperature: number;
  pressure: number;
  method: Method;
  methodDetail: string | null;
  source: SourceRef;
  enteredBy: string | null;
  approvedBy: string | null;
  createdAt: Date;
  history: { id: string; versionNo: number; value: number; uncertainty: number | null; retired: boolean; createdAt: Date; releases: string[] }[];
}

export interface QuantityView {
  quantity: Quantity;
  symbol: string;
  unit: 'J/mol' | 'J/(mol·K)';
  transitionKind: TransitionKind | null;
  recommended: ValueView | null;
  alternatives: ValueView[];
}

export interface FitView {
  id: string;
  form: FitForm;
  tMin: number;
  tMax: number;
  pressure: number;
  ranges: unknown[];
  source: SourceRef;
  recommended: boolean;
}

export interface SpeciesDetail {
  id: string;
  formula: string;
  hillFormula: string;
  name: string;
  charge: number;
  molarMass: number;
  synonyms: string[];
  identifiers: { inchi: string | null; inchiKey: string | null; casRn: string | null; smiles: string | null };
  release: string;
  phases: (PhaseRef & { quantities: QuantityView[]; fits: FitView[] })[];
}

const QUANTITY_ORDER: Quantity[] = ['dfH', 'dfG', 'S', 'Cp', 'dtrsH'];
const PHASE_ORDER_SQL = `array_position(ARRAY['cr','am','l','g','aq','aq,inf']::text[], sp.phase)`;

interface SourceRow {
  sourceId: string;
  sourceKey: string;
  sourceTitle: string;
  sourceYear: number | null;
  doi: string | null;
  csl: Record<string, unknown> | null;
}

const citations = new Map<string, string>();
const counts = new Map<string, { until: number; total: Promise<number> }>();
const COUNT_TTL_MS = 10 * 60_000;
const COUNT_CACHE_LIMIT = 5_000;

/** The citation of a source row, formatted once per source version. */
export function sourceRef(row: SourceRow & { sourceVersion?: number }): SourceRef {
  const key = `${row.sourceId}|${row.sourceVersion ?? 0}`;
  let citation = citations.get(key);
  if (citation === undefined) {
    citation = formatCitation(row.csl, { title: row.sourceTitle, year: row.sourceYear, doi: row.doi });
    if (citations.size > 10_000) citations.clear();
    citations.set(key, citation);
  }
  return { id: row.sourceId, key: row.sourceKey, citation, doi: row.doi };
}

/** Columns of a source joined as `src`, for `sourceRef`. */
export const SOURCE_COLUMNS = `src.id AS "sourceId", src.short_key AS "sourceKey", src.title AS "sourceTitle", src.year AS "sourceYear",
  src.doi, src.csl, src.version AS "sourceVersion"`;

export class SpeciesService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * One page of species matching the filters that hold data in the release, with the phases each
   * holds there. Two queries per page (the page with its total, then the phases of its species).
   */
  async search(
    release: ResolvedRelease,
    filter: SpeciesFilter,
    page: { page: number; pageSize: number; sort?: SpeciesSort },
  ): Promise<{ items: SpeciesSummary[]; total: number; page: number; pageSize: number; release: string }> {
    const params: unknown[] = [release.id];
    const { where, rank } = speciesConditions(filter, params, '$1');
    const limit = `$${params.push(page.pageSize)}`;
    const offset = `$${params.push((page.page - 1) * page.pageSize)}`;
    const counting = this.total(release, filter);
    // One round trip: the page, then (outside it, so only for the page's rows) the phases each holds.
    const rows: SpeciesSummary[] = await this.dataSource.query(
      `SELECT page.*,
              (SELECT coalesce(json_agg(json_build_object('phase', sp.phase, 'polymorph', sp.polymorph)
                                        ORDER BY ${PHASE_ORDER_SQL}, sp.polymorph NULLS FIRST), '[]')
                 FROM species_phases sp
                WHERE sp.species_id = page.id
                  AND EXISTS (SELECT 1 FROM release_members m WHERE m.release_id = $1 AND m.species_phase_id = sp.id)) AS phases
         FROM (SELECT s.id, s.formula, s.hill_formula AS "hillFormula", s.name, s.charge, s.molar_mass AS "molarMass"
                 FROM species s
                WHERE ${where}
                ORDER BY ${speciesOrder(page.sort, rank)}
                LIMIT ${limit} OFFSET ${offset}) page`,
      params,
    );
    // A first page that is not full is the whole answer: no count needed.
    const total = page.page === 1 && rows.length < page.pageSize ? rows.length : await counting.value();
    return {
      items: rows,
      total,
      page: page.page,
      pageSize: page.pageSize,
      release: release.label,
    };
  }

  /**
   * How many species match, counted lazily (only when a page needs it) and remembered for a
   * while for a published release, whose membership never changes: counting a broad filter over
   * a large catalogue costs far more than fetching a page.
   */
  private total(release: ResolvedRelease, filter: SpeciesFilter): { value(): Promise<number> } {
    const key = `${release.id}|${JSON.stringify(filter)}`;
    return {
      value: () => {
        const cached = counts.get(key);
        if (cached && cached.until > Date.now()) return cached.total;
        const params: unknown[] = [release.id];
        const { where } = speciesConditions(filter, params, '$1');
        const total = this.dataSource.query(`SELECT count(*)::int AS n FROM species s WHERE ${where}`, params).then((r: { n: number }[]) => r[0].n);
        if (release.status === 'published') {
          if (counts.size >= COUNT_CACHE_LIMIT) counts.clear();
          counts.set(key, { until: Date.now() + COUNT_TTL_MS, total });
          total.catch(() => counts.delete(key));
        }
        return total;
      },
    };
  }

  /**
   * Everything release R holds about a species: per phase, each quantity's recommended value and
   * the alternatives, the heat-capacity fits, and each value's version history as of R (versions
   * up to the one R holds, and the published releases up to R that held each).
   *
   * @throws NotFoundError when the species does not exist or holds no data in the release
   */
  async detail(release: ResolvedRelease, speciesId: string): Promise<SpeciesDetail> {
    const [species]: (Omit<SpeciesDetail, 'identifiers' | 'release' | 'phases'> & { inchi: string | null; inchikey: string | null; casRn: string | null; smiles: string | null })[] =
      await this.dataSource.query(
        `SELECT id, formula, hill_formula AS "hillFormula", name, charge, molar_mass AS "molarMass", synonyms, inchi, inchikey,
                cas_rn AS "casRn", smiles
           FROM species WHERE id = $1`,
        [speciesId],
      );
    if (!species) throw new NotFoundError(`No species ${speciesId}`);

    const [values, fits] = await Promise.all([
      this.dataSource.query(
        `SELECT sp.phase, sp.polymorph, m.is_recommended AS recommended, v.id, v.lineage_id AS "lineageId", v.version_no AS "versionNo",
                v.quantity, v.transition_kind AS "transitionKind", v.value_si AS "value", v.uncertainty_si AS uncertainty,
                v.uncertainty_kind AS "uncertaintyKind", v.coverage_factor AS "coverageFactor", v.temperature_k AS temperature,
                v.pressure_pa AS pressure, v.method, v.level_of_theory AS "methodDetail", v.created_at AS "createdAt",
                ue.display_name AS "enteredBy", ua.display_name AS "approvedBy", ${SOURCE_COLUMNS}
           FROM release_members m
           JOIN species_phases sp ON sp.id = m.species_phase_id
           JOIN thermo_values v ON v.id = m.value_id
           ${citedSourceJoin('v.source_id')}
           LEFT JOIN users ue ON ue.id = v.entered_by
           LEFT JOIN users ua ON ua.id = v.approved_by
          WHERE m.release_id = $1 AND sp.species_id = $2
          ORDER BY ${PHASE_ORDER_SQL}, sp.polymorph NULLS FIRST, v.quantity, v.transition_kind NULLS FIRST, m.is_recommended DESC, src.short_key, v.lineage_id`,
        [release.id, speciesId],
      ) as Promise<(ValueRowOut & PhaseRef)[]>,
      this.dataSource.query(
        `SELECT sp.phase, sp.polymorph, m.is_recommended AS recommended, f.id, f.form, f.t_min_k AS "tMin", f.t_max_k AS "tMax",
                f.pressure_pa AS pressure, f.ranges, ${SOURCE_COLUMNS}
           FROM release_members m
           JOIN species_phases sp ON sp.id = m.species_phase_id
           JOIN heat_capacity_fits f ON f.id = m.fit_id
           ${citedSourceJoin('f.source_id')}
          WHERE m.release_id = $1 AND sp.species_id = $2
          ORDER BY ${PHASE_ORDER_SQL}, sp.polymorph NULLS FIRST, m.is_recommended DESC, src.short_key, f.lineage_id`,
        [release.id, speciesId],
      ) as Promise<(FitRowOut & PhaseRef)[]>,
    ]);
    if (values.length === 0 && fits.length === 0) throw new NotFoundError(`Species ${speciesId} holds no data in release ${release.label}`);

    const history = await this.history(release, values.map((v) => ({ lineageId: v.lineageId, versionNo: v.versionNo })));
    const phases = new Map<string, SpeciesDetail['phases'][number]>();
    const phaseOf = (row: PhaseRef) => {
      const key = `${row.phase}|${row.polymorph ?? ''}`;
      let phase = phases.get(key);
      if (!phase) {
        phase = { phase: row.phase, polymorph: row.polymorph, quantities: [], fits: [] };
        phases.set(key, phase);
      }
      return phase;
    };
    for (const row of values) {
      const phase = phaseOf(row);
      let entry = phase.quantities.find((q) => q.quantity === row.quantity && q.transitionKind === row.transitionKind);
      if (!entry) {
        entry = { quantity: row.quantity, symbol: QUANTITY_SYMBOLS[row.quantity], unit: SI_UNITS[row.quantity], transitionKind: row.transitionKind, recommended: null, alternatives: [] };
        phase.quantities.push(entry);
      }
      const view: ValueView = {
        id: row.id,
        lineageId: row.lineageId,
        versionNo: row.versionNo,
        value: row.value,
        uncertainty: row.uncertainty,
        uncertaintyKind: row.uncertaintyKind,
        coverageFactor: row.coverageFactor,
        unit: SI_UNITS[row.quantity],
        temperature: row.temperature,
        pressure: row.pressure,
        method: row.method,
        methodDetail: row.methodDetail,
        source: sourceRef(row),
        enteredBy: row.enteredBy,
        approvedBy: row.approvedBy,
        createdAt: row.createdAt,
        history: history.get(row.lineageId) ?? [],
      };
      if (row.recommended) entry.recommended = view;
      else entry.alternatives.push(view);
    }
    for (const row of fits) {
      phaseOf(row).fits.push({
        id: row.id, form: row.form, tMin: row.tMin, tMax: row.tMax, pressure: row.pressure, ranges: row.ranges, source: sourceRef(row), recommended: row.recommended,
      });
    }
    for (const phase of phases.values()) {
      phase.quantities.sort((a, b) => QUANTITY_ORDER.indexOf(a.quantity) - QUANTITY_ORDER.indexOf(b.quantity));
    }
    const { inchi, inchikey, casRn, smiles, ...rest } = species;
    return {
      ...rest,
      identifiers: { inchi, inchiKey: inchikey, casRn, smiles },
      release: release.label,
      phases: [...phases.values()].sort((a, b) => phaseRank(a.phase) - phaseRank(b.phase) || (a.polymorph ?? '').localeCompare(b.polymorph ?? '')),
    };
  }

  /** Versions of each lineage up to the one release R holds, each with the releases (up to R) that held it. */
  private async history(release: ResolvedRelease, members: { lineageId: string; versionNo: number }[]): Promise<Map<string, ValueView['history']>> {
    const byLineage = new Map<string, ValueView['history']>();
    if (members.length === 0) return byLineage;
    const [year, sequence] = release.label.split('.').map(Number);
    const rows: (ValueView['history'][number] & { lineageId: string })[] = await this.dataSource.query(
      `SELECT v.id, v.lineage_id AS "lineageId", v.version_no AS "versionNo", v.value_si AS value, v.uncertainty_si AS uncertainty,
              v.is_retired AS retired, v.created_at AS "createdAt",
              coalesce(array_agg(r.label ORDER BY split_part(r.label, '.', 1)::int, split_part(r.label, '.', 2)::int)
                       FILTER (WHERE r.id IS NOT NULL), '{}') AS releases
         FROM unnest($1::uuid[], $2::int[]) AS held(lineage_id, version_no)
         JOIN thermo_values v ON v.lineage_id = held.lineage_id AND v.version_no <= held.version_no
         LEFT JOIN release_members m ON m.value_id = v.id
         LEFT JOIN releases r ON r.id = m.release_id
              AND (r.id = $3 OR (r.status = 'published'
                   AND (split_part(r.label, '.', 1)::int, split_part(r.label, '.', 2)::int) <= ($4::int, $5::int)))
        GROUP BY v.id
        ORDER BY v.lineage_id, v.version_no`,
      [members.map((m) => m.lineageId), members.map((m) => m.versionNo), release.id, year, sequence],
    );
    for (const { lineageId, ...entry } of rows) {
      const list = byLineage.get(lineageId) ?? [];
      list.push(entry);
      byLineage.set(lineageId, list);
    }
    return byLineage;
  }
}

/** Crystal, amorphous, liquid, gas, aqueous: the order the tables print phases in. */
function phaseRank(phase: PhaseCode): number {
  return ['cr', 'am', 'l', 'g', 'aq', 'aq,inf'].indexOf(phase);
}

interface ValueRowOut extends SourceRow {
  recommended: boolean;
  id: string;
  lineageId: string;
  versionNo: number;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  value: number;
  uncertainty: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  temperature: number;
  pressure: number;
  method: Method;
  methodDetail: string | null;
  createdAt: Date;
  enteredBy: string | null;
  approvedBy: string | null;
}

interface FitRowOut extends SourceRow {
  recommended: boolean;
  id: string;
  form: FitForm;
  tMin: number;
  tMax: number;
  pressure: number;
  ranges: unknown[];
}
