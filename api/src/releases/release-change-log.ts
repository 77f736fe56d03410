import type { EntityManager } from 'typeorm';
import { QUANTITY_SYMBOLS, type Quantity, type TransitionKind } from '../values/value-vocabulary';
import { phaseLabel, type PhaseCode } from '../species/phase-code';
import { releaseDiff, summarizeChanges, type ReleaseChangeKind } from './release-diff';

/** A value or fit version as the change log shows it. */
export interface ChangeLogVersion {
  id: string;
  /** value: J/mol or J/(mol·K); null for a fit */
  valueSi: number | null;
  uncertaintySi: number | null;
  /** as entered, e.g. "-302.6 ± 0.4" and "kJ/mol"; for a fit, its form and range */
  entered: string;
  sourceKey: string;
  recommended: boolean | null;
}

export interface ChangeLogEntry {
  change: ReleaseChangeKind;
  memberKind: 'value' | 'fit';
  lineageId: string;
  speciesPhaseId: string;
  phase: PhaseCode;
  polymorph: string | null;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  /** e.g. "ΔfH°(l)", "Cp°(T) fit (g)" */
  label: string;
  from: ChangeLogVersion | null;
  to: ChangeLogVersion | null;
}

export interface ChangeLogSpecies {
  speciesId: string;
  hillFormula: string;
  name: string;
  added: ChangeLogEntry[];
  revised: ChangeLogEntry[];
  retired: ChangeLogEntry[];
  /** left out without a retirement record */
  removed: ChangeLogEntry[];
  /** same version, recommended flag changed */
  recommendation: ChangeLogEntry[];
}

/** What a release changed against the release before it: stored with the release when it is published. */
export interface ReleaseChangeLog {
  release: string;
  comparedWith: string | null;
  generatedAt: string;
  summary: Record<ReleaseChangeKind, number>;
  /** per species, ordered by Hill formula and name */
  species: ChangeLogSpecies[];
  /** flat list in the demo seed's layout (change, lineageId, species, name, phase, polymorph, kind, quantity) */
  changes: { change: ReleaseChangeKind; lineageId: string; species: string; name: string; phase: PhaseCode; polymorph: string | null; kind: 'value' | 'fit'; quantity: Quantity }[];
}

/**
 * The previous published release of `label` by label order (year, then number), or null.
 */
export async function previousPublishedLabel(manager: EntityManager, label: string): Promise<string | null> {
  const [row] = await manager.query(
    `SELECT label FROM releases
      WHERE status = 'published'
        AND (split_part(label, '.', 1)::int, split_part(label, '.', 2)::int) < (split_part($1, '.', 1)::int, split_part($1, '.', 2)::int)
      ORDER BY split_part(label, '.', 1)::int DESC, split_part(label, '.', 2)::int DESC LIMIT 1`,
    [label],
  );
  return row?.label ?? null;
}

/**
 * The change log of release `label` (published or in preparation): every value and fit lineage
 * added, revised, retired, removed or re-recommended since `comparedWith` (default: the published
 * release before it), grouped per species, with the old and new numbers and their sources.
 */
export async function generateChangeLog(manager: EntityManager, label: string, comparedWith?: string | null): Promise<ReleaseChangeLog> {
  const base = comparedWith === undefined ? await previousPublishedLabel(manager, label) : comparedWith;
  const changes = await releaseDiff(manager, base, label);
  const valueIds = changes.filter((c) => c.memberKind === 'value').flatMap((c) => [c.fromId, c.toId]).filter((x): x is string => !!x);
  const fitIds = changes.filter((c) => c.memberKind === 'fit').flatMap((c) => [c.fromId, c.toId]).filter((x): x is string => !!x);
  const versions = new Map<string, Omit<ChangeLogVersion, 'recommended'>>();
  if (valueIds.length > 0) {
    const rows: { id: string; valueSi: number; uncertaintySi: number | null; enteredValue: string; enteredUnit: string; sourceKey: string }[] = await manager.query(
      `SELECT v.id, v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi", v.entered_value AS "enteredValue", v.entered_unit AS "enteredUnit", s.short_key AS "sourceKey"
         FROM thermo_values v JOIN sources s ON s.id = v.source_id WHERE v.id = ANY($1::uuid[])`,
      [valueIds],
    );
    for (const r of rows) versions.set(r.id, { id: r.id, valueSi: r.valueSi, uncertaintySi: r.uncertaintySi, entered: `${r.enteredValue} ${r.enteredUnit}`, sourceKey: r.sourceKey });
  }
  if (fitIds.length > 0) {
    const rows: { id: string; form: string; tMinK: number; tMaxK: number; sourceKey: string }[] = await manager.query(
      `SELECT f.id, f.form, f.t_min_k AS "tMinK", f.t_max_k AS "tMaxK", s.short_key AS "sourceKey"
         FROM heat_capacity_fits f JOIN sources s ON s.id = f.source_id WHERE f.id = ANY($1::uuid[])`,
      [fitIds],
    );
    for (const r of rows) versions.set(r.id, { id: r.id, valueSi: null, uncertaintySi: null, entered: `${r.form} fit, ${r.tMinK}–${r.tMaxK} K`, sourceKey: r.sourceKey });
  }

  const species = new Map<string, ChangeLogSpecies>();
  for (const c of changes) {
    let group = species.get(c.speciesId);
    if (!group) {
      group = { speciesId: c.speciesId, hillFormula: c.hillFormula, name: c.speciesName, added: [], revised: [], retired: [], removed: [], recommendation: [] };
      species.set(c.speciesId, group);
    }
    const phase = phaseLabel(c.phase, c.polymorph);
    const symbol = c.memberKind === 'fit' ? 'Cp°(T) fit' : c.quantity === 'dtrsH' && c.transitionKind ? `Δ${c.transitionKind}H` : QUANTITY_SYMBOLS[c.quantity];
    const version = (id: string | null, recommended: boolean | null) => (id && versions.has(id) ? { ...versions.get(id)!, recommended } : null);
    group[c.change].push({
      change: c.change, memberKind: c.memberKind, lineageId: c.lineageId, speciesPhaseId: c.speciesPhaseId, phase: c.phase, polymorph: c.polymorph,
      quantity: c.quantity, transitionKind: c.transitionKind, label: `${symbol}(${phase})`,
      from: version(c.fromId, c.fromRecommended), to: version(c.toId, c.toRecommended),
    });
  }
  return {
    release: label,
    comparedWith: base,
    generatedAt: new Date().toISOString(),
    summary: summarizeChanges(changes),
    species: [...species.values()],
    changes: changes.map((c) => ({ change: c.change, lineageId: c.lineageId, species: c.hillFormula, name: c.speciesName, phase: c.phase, polymorph: c.polymorph, kind: c.memberKind, quantity: c.quantity })),
  };
}
