import type { DataSource } from 'typeorm';
import { NotFoundError } from '../shared/errors';
import type { PhaseCode } from '../species/phase-code';
import { SI_UNITS, type Quantity } from '../values/value-vocabulary';
import { releaseDiff, type ReleaseChange } from './release-diff';
import { compareReleaseLabels } from './release-resolution';
import type { ReleaseStatus } from './release.entity';
import { citedSourceJoin } from '../sources/cited-source';

export interface ReleaseSummary {
  label: string;
  status: ReleaseStatus;
  notes: string;
  publishedAt: Date | null;
  publishedBy: string | null;
  latest: boolean;
}

/** A value or fit version as a change-log entry shows it. */
export type MemberSnapshot =
  | { kind: 'value'; id: string; versionNo: number; value: number; uncertainty: number | null; unit: string; source: string; recommended: boolean }
  | { kind: 'fit'; id: string; versionNo: number; form: string; tMin: number; tMax: number; source: string; recommended: boolean };

export interface ChangeEntry {
  speciesId: string;
  formula: string;
  hillFormula: string;
  name: string;
  phase: PhaseCode;
  polymorph: string | null;
  kind: 'value' | 'fit';
  quantity: Quantity;
  transitionKind: string | null;
  change: 'added' | 'revised' | 'retired';
  /** what exactly happened when `change` alone does not say it */
  reason: 'new version' | 'now recommended' | 'no longer recommended' | 'retired' | 'left out' | 'new lineage';
  before: MemberSnapshot | null;
  after: MemberSnapshot | null;
}

export interface ReleaseDetail extends ReleaseSummary {
  counts: { species: number; speciesPhases: number; values: number; recommendedValues: number; fits: number; sources: number };
  comparedWith: string | null;
  summary: { added: number; revised: number; retired: number };
  changeLog: ChangeEntry[];
}

interface ReleaseRow {
  id: string;
  label: string;
  status: ReleaseStatus;
  notes: string;
  publishedAt: Date | null;
  publishedBy: string | null;
}

export class ReleasesService {
  constructor(private readonly dataSource: DataSource) {}

  /** Releases, newest first; those in preparation only when `withPreparing`. */
  async list(withPreparing: boolean): Promise<ReleaseSummary[]> {
    const rows = await this.rows();
    const latest = latestPublished(rows);
    return rows
      .filter((r) => withPreparing || r.status === 'published')
      .sort((a, b) => compareReleaseLabels(b.label, a.label))
      .map((r) => summary(r, latest));
  }

  /**
   * A release with its counts and its change log against the published release before it.
   * @throws NotFoundError for an unknown label, or one in preparation the caller may not see
   */
  async detail(label: string, withPreparing: boolean): Promise<ReleaseDetail> {
    const rows = await this.rows();
    const row = rows.find((r) => r.label === label);
    if (!row || (row.status !== 'published' && !withPreparing)) throw new NotFoundError(`No release ${label}`);
    const previous = rows
      .filter((r) => r.status === 'published' && compareReleaseLabels(r.label, label) < 0)
      .sort((a, b) => compareReleaseLabels(b.label, a.label))[0];
    const [counts, changeLog] = await Promise.all([this.counts(row.id), this.changes(previous?.label ?? null, label)]);
    return { ...summary(row, latestPublished(rows)), counts, comparedWith: previous?.label ?? null, summary: tally(changeLog), changeLog };
  }

  /** What changed from release `from` to release `to` (either order). */
  async diff(from: string, to: string, withPreparing: boolean): Promise<{ from: string; to: string; summary: ReleaseDetail['summary']; changeLog: ChangeEntry[] }> {
    const rows = await this.rows();
    for (const label of [from, to]) {
      const row = rows.find((r) => r.label === label);
      if (!row || (row.status !== 'published' && !withPreparing)) throw new NotFoundError(`No release ${label}`);
    }
    const changeLog = await this.changes(from, to);
    return { from, to, summary: tally(changeLog), changeLog };
  }

  /** True when every named release is published (their answers never change). */
  async allPublished(labels: string[]): Promise<boolean> {
    const rows = await this.rows();
    return labels.every((l) => rows.find((r) => r.label === l)?.status === 'published');
  }

  private rows(): Promise<ReleaseRow[]> {
    return this.dataSource.query(
      `SELECT r.id, r.label, r.status, r.notes, r.published_at AS "publishedAt", u.display_name AS "publishedBy"
         FROM releases r LEFT JOIN users u ON u.id = r.published_by`,
    );
  }

  private async counts(releaseId: string): Promise<ReleaseDetail['counts']> {
    const [row] = await this.dataSource.query(
      `SELECT count(DISTINCT sp.species_id)::int AS species, count(DISTINCT m.species_phase_id)::int AS "speciesPhases",
              count(*) FILTER (WHERE m.member_kind = 'value')::int AS values,
              count(*) FILTER (WHERE m.member_kind = 'value' AND m.is_recommended)::int AS "recommendedValues",
              count(*) FILTER (WHERE m.member_kind = 'fit')::int AS fits,
              count(DISTINCT coalesce(v.source_id, f.source_id))::int AS sources
         FROM release_members m
         JOIN species_phases sp ON sp.id = m.species_phase_id
         LEFT JOIN thermo_values v ON v.id = m.value_id
         LEFT JOIN heat_capacity_fits f ON f.id = m.fit_id
        WHERE m.release_id = $1`,
      [releaseId],
    );
    return row;
  }

  private async changes(from: string | null, to: string): Promise<ChangeEntry[]> {
    const diff = await releaseDiff(this.dataSource.manager, from, to);
    const ids = diff.flatMap((c) => [c.fromId, c.toId]).filter((id): id is string => id !== null);
    const [snapshots, formulas] = await Promise.all([this.snapshots(ids), this.formulas([...new Set(diff.map((c) => c.speciesId))])]);
    return diff.map((c) => entry(c, formulas.get(c.speciesId) ?? c.hillFormula, snapshots));
  }

  /** Value and fit versions by id, as change-log entries show them (each entry sets its recommended flag). */
  private async snapshots(ids: string[]): Promise<Map<string, MemberSnapshot>> {
    const byId = new Map<string, MemberSnapshot>();
    if (ids.length === 0) return byId;
    const [values, fits] = await Promise.all([
      this.dataSource.query(
        `SELECT v.id, v.version_no AS "versionNo", v.quantity, v.value_si AS value, v.uncertainty_si AS uncertainty, s.short_key AS source
           FROM thermo_values v ${citedSourceJoin('v.source_id', 's')} WHERE v.id = ANY($1::uuid[])`,
        [ids],
      ),
      this.dataSource.query(
        `SELECT f.id, f.version_no AS "versionNo", f.form, f.t_min_k AS "tMin", f.t_max_k AS "tMax", s.short_key AS source
           FROM heat_capacity_fits f ${citedSourceJoin('f.source_id', 's')} WHERE f.id = ANY($1::uuid[])`,
        [ids],
      ),
    ]);
    for (const v of values as { id: string; versionNo: number; quantity: Quantity; value: number; uncertainty: number | null; source: string }[]) {
      byId.set(v.id, { kind: 'value', id: v.id, versionNo: v.versionNo, value: v.value, uncertainty: v.uncertainty, unit: SI_UNITS[v.quantity], source: v.source, recommended: false });
    }
    for (const f of fits as { id: string; versionNo: number; form: string; tMin: number; tMax: number; source: string }[]) {
      byId.set(f.id, { kind: 'fit', ...f, recommended: false });
    }
    return byId;
  }

  private async formulas(speciesIds: string[]): Promise<Map<string, string>> {
    if (speciesIds.length === 0) return new Map();
    const rows: { id: string; formula: string }[] = await this.dataSource.query(`SELECT id, formula FROM species WHERE id = ANY($1::uuid[])`, [speciesIds]);
    return new Map(rows.map((r) => [r.id, r.formula]));
  }
}

function latestPublished(rows: ReleaseRow[]): string | undefined {
  return rows.filter((r) => r.status === 'published').sort((a, b) => compareReleaseLabels(b.label, a.label))[0]?.label;
}

function summary(row: ReleaseRow, latest: string | undefined): ReleaseSummary {
  return { label: row.label, status: row.status, notes: row.notes, publishedAt: row.publishedAt, publishedBy: row.publishedBy, latest: row.label === latest };
}

function entry(c: ReleaseChange, formula: string, snapshots: Map<string, MemberSnapshot>): ChangeEntry {
  const snap = (id: string | null, recommended: boolean | null): MemberSnapshot | null => {
    const s = id ? snapshots.get(id) : undefined;
    return s ? { ...s, recommended: recommended ?? false } : null;
  };
  const [change, reason]: [ChangeEntry['change'], ChangeEntry['reason']] = (() => {
    switch (c.change) {
      case 'added':
        return ['added', 'new lineage'];
      case 'retired':
        return ['retired', 'retired'];
      case 'removed':
        return ['retired', 'left out'];
      case 'revised':
        return ['revised', 'new version'];
      default:
        return ['revised', c.toRecommended ? 'now recommended' : 'no longer recommended'];
    }
  })();
  return {
    speciesId: c.speciesId,
    formula,
    hillFormula: c.hillFormula,
    name: c.speciesName,
    phase: c.phase,
    polymorph: c.polymorph,
    kind: c.memberKind,
    quantity: c.quantity,
    transitionKind: c.transitionKind,
    change,
    reason,
    before: snap(c.fromId, c.fromRecommended),
    after: snap(c.toId, c.toRecommended),
  };
}

function tally(entries: ChangeEntry[]): ReleaseDetail['summary'] {
  const counts = { added: 0, revised: 0, retired: 0 };
  for (const e of entries) counts[e.change]++;
  return counts;
}
