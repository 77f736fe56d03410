import bcrypt from 'bcryptjs';
import { createHash } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { publishRelease } from '../api/src/releases/release-assembly';
import { releaseDiff, summarizeChanges } from '../api/src/releases/release-diff';
import type { ObjectStore } from '../api/src/storage/object-store';
import { hillFormula } from '../api/src/thermo/formula-format';
import { parseFormula } from '../api/src/thermo/formula';
import { molarMass } from '../api/src/thermo/molar-mass';
import type { Quantity } from '../api/src/values/value-vocabulary';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';
import {
  DEMO_IMPORT_JOB,
  DEMO_PROPOSALS,
  DEMO_SAVED_REACTIONS,
  DEMO_SOURCES,
  DEMO_SPECIES,
  DEMO_WATCHES,
  type DemoValue,
} from './demo-scenario';
import {
  REFERENCE_FITS,
  REFERENCE_RETIREMENTS,
  REFERENCE_REVISIONS,
  REFERENCE_SOURCES,
  REFERENCE_SPECIES,
  REFERENCE_VALUES,
  type ReferenceSpecies,
} from './reference-set';
import { insertMissing, scaledDecimal, seedId } from './seed-support';

/** Where evidence files go: the object store, or anything with the same `put`. */
export type EvidenceStore = Pick<ObjectStore, 'put'>;

export interface DemoLoadSummary {
  /** wall time of the load / ms */
  durationMs: number;
  /** rows this run added, per table (all zero on a repeated run) */
  inserted: Record<string, number>;
  /** rows now in each table */
  counts: Record<string, number>;
  /** evidence files written to the object store this run */
  uploaded: number;
}

const RELEASES = [
  { label: '2026.1', status: 'published', createdAt: '2026-01-05T09:00:00Z', publishedAt: '2026-01-26T10:00:00Z',
    notes: 'First reference release: CODATA Key Values (1989) for the elements and common compounds, NBS tables (1982) for C1–C2 organics, the NASA TM-4513 polynomial for N2(g).' },
  { label: '2026.2', status: 'published', createdAt: '2026-05-04T09:00:00Z', publishedAt: '2026-06-15T10:00:00Z',
    notes: 'Adds NIST-JANAF (1998) values at 298.15 K and the NASA TM-4513 polynomial for H2O(g); JANAF becomes the recommended Cp° source; uncertainty added to ΔfH°(C, g); a duplicate NBS entry retired; propan-1-ol (l) from the TC-03/DSC-07 campaign.' },
  { label: '2027.1', status: 'preparing', createdAt: '2026-11-02T09:00:00Z', publishedAt: null,
    notes: 'In preparation: ethyl acetate (l) from the TC-03/DSC-07 campaign.' },
] as const;
type ReleaseLabel = (typeof RELEASES)[number]['label'];

const TABLES = [
  'users', 'sources', 'species', 'species_phases', 'thermo_values', 'heat_capacity_fits', 'releases', 'release_members',
  'proposals', 'proposal_items', 'proposal_reviews', 'proposal_comments', 'evidence_files', 'watches', 'saved_reactions',
  'saved_reaction_terms', 'import_jobs', 'audit_entries',
] as const;

const SOURCE_PRIORITY: Record<string, number> = Object.fromEntries(REFERENCE_SOURCES.map((s) => [s.key, s.priority]));
const DEMO_SOURCE_PRIORITY = 9;
const T_REF = 298.15;
const P_STD = 100000;

const sourceId = (key: string) => seedId('source', key);
const speciesId = (key: string) => seedId('species', key);
const phaseId = (species: string, phase: string) => seedId('phase', `${species}(${phase})`);
const valueId = (key: string) => seedId('value', key);
const fitId = (key: string) => seedId('fit', key);
const releaseId = (label: string) => seedId('release', label);
const proposalId = (key: string) => seedId('proposal', key);
const itemId = (proposal: string, item: string) => seedId('proposal-item', `${proposal}/${item}`);
const evidenceId = (key: string) => seedId('evidence', key);

/** A value or fit version with what the release builder needs to know about it. */
interface Version {
  kind: 'value' | 'fit';
  id: string;
  lineage: string;
  /** species phase, kind, quantity and transition: the recommended-value group */
  group: string;
  priority: number;
  order: number;
  release: ReleaseLabel;
  proposalId: string | null;
}
type LedgerEvent = { release: ReleaseLabel; add?: Version; retireLineage?: string };

/**
 * Loads the reference set and the demo scenario (see seeds-demo/README.md). Idempotent: every row
 * has a fixed id (or, for users, its e-mail address) and is inserted only when missing, releases are
 * built only when they do not exist yet, so a second run inserts nothing and changes nothing. Runs
 * in one transaction under an advisory lock, so two loaders never interleave.
 *
 * @param store when given, evidence files are also written to the object store (same key, same bytes)
 */
export async function loadDemoData(dataSource: DataSource, store?: EvidenceStore): Promise<DemoLoadSummary> {
  const started = performance.now();
  const inserted: Record<string, number> = Object.fromEntries(TABLES.map((t) => [t, 0]));
  const count = (table: string, n: number) => {
    inserted[table] = (inserted[table] ?? 0) + n;
  };
  let uploaded = 0;

  const counts = await dataSource.transaction(async (m) => {
    await m.query(`SELECT pg_advisory_xact_lock(hashtext('kelvindex-demo-seed'))`);

    const users = await loadUsers(m, count);
    const userId = (email: string) => {
      const id = users.get(email);
      if (!id) throw new Error(`Demo user ${email} is missing`);
      return id;
    };

    // Releases first (proposals point at them); a release that already exists is left alone.
    const existingReleases = new Set((await m.query(`SELECT label FROM releases WHERE id = ANY($1)`, [RELEASES.map((r) => releaseId(r.label))]))
      .map((r: { label: string }) => r.label));
    count('releases', await insertMissing(m, 'releases', RELEASES.filter((r) => !existingReleases.has(r.label)).map((r) => ({
      id: releaseId(r.label), label: r.label, notes: r.notes, status: 'preparing', created_by: userId('editor@kelvindex.test'), created_at: r.createdAt,
    }))));

    count('sources', await insertMissing(m, 'sources', [
      ...REFERENCE_SOURCES.map((s) => ({ id: sourceId(s.key), short_key: s.key, title: s.title, year: s.year, doi: null, csl: JSON.stringify(s.csl), notes: s.notes, created_by: null, created_at: '2026-01-05T09:00:00Z' })),
      ...DEMO_SOURCES.map((s) => ({ id: sourceId(s.key), short_key: s.key, title: s.title, year: s.year, doi: null, csl: JSON.stringify(s.csl), notes: s.notes, created_by: userId('steward@kelvindex.test'), created_at: '2026-03-01T09:00:00Z' })),
    ]));

    const allSpecies = [...REFERENCE_SPECIES, ...DEMO_SPECIES];
    count('species', await insertMissing(m, 'species', allSpecies.map(speciesRow)));
    count('species_phases', await insertMissing(m, 'species_phases', allSpecies.flatMap((s) => s.phases.map((p) => {
      const label = p.polymorph ? `${p.phase}, ${p.polymorph}` : p.phase;
      return { id: phaseId(s.key, label), species_id: speciesId(s.key), phase: p.phase, polymorph: p.polymorph ?? null, is_reference_state: p.referenceState ?? false };
    }))));

    await loadProposals(m, userId, count, false);

    // Values: first versions, then revisions, then retirements (the chain trigger needs the predecessor).
    const ledger: LedgerEvent[] = [];
    const referenceValueRows = REFERENCE_VALUES.map((v, order) => {
      const id = valueId(v.key);
      ledger.push({ release: v.release, add: { kind: 'value', id, lineage: id, group: group(v.species, v.phase, 'value', v.quantity), priority: SOURCE_PRIORITY[v.source], order, release: v.release, proposalId: null } });
      return valueRow({
        id, lineage: id, version: 1, supersedes: null, species: v.species, phaseLabel: v.phase, quantity: v.quantity, value: v.value, uncertainty: v.uncertainty,
        unit: v.unit, source: v.source, expanded: v.source === 'codata-1989', method: 'evaluated', enteredBy: null, approvedBy: null, item: null,
        notes: [v.notes, `Reading: ${v.reading}.`].filter(Boolean).join(' '), createdAt: releaseDate(v.release), retiredReason: null,
        transitionKind: v.transitionKind ?? null,
      });
    });
    const demoValueRows = DEMO_PROPOSALS.flatMap((p) => p.items.filter((i) => i.resultValue).map((i) => {
      const v = i.resultValue!;
      const id = valueId(v.key);
      const approval = p.reviews.find((r) => r.decision === 'approve');
      ledger.push({ release: p.release!, add: { kind: 'value', id, lineage: id, group: group(v.species, v.phase, 'value', v.quantity), priority: DEMO_SOURCE_PRIORITY, order: 10000, release: p.release!, proposalId: proposalId(p.key) } });
      return demoValueRow(v, id, {
        enteredBy: userId(p.author), approvedBy: approval ? userId(approval.reviewer) : null, item: itemId(p.key, i.key), createdAt: p.decidedAt!,
      });
    }));
    count('thermo_values', await insertMissing(m, 'thermo_values', [...referenceValueRows, ...demoValueRows]));

    const byKey = new Map(REFERENCE_VALUES.map((v) => [v.key, v]));
    count('thermo_values', await insertMissing(m, 'thermo_values', REFERENCE_REVISIONS.map((r) => {
      const previous = byKey.get(r.revises)!;
      const id = valueId(r.key);
      ledger.push({ release: r.release, add: { kind: 'value', id, lineage: valueId(r.revises), group: group(previous.species, previous.phase, 'value', previous.quantity), priority: SOURCE_PRIORITY[previous.source], order: REFERENCE_VALUES.indexOf(previous), release: r.release, proposalId: null } });
      return valueRow({
        id, lineage: valueId(r.revises), version: 2, supersedes: valueId(r.revises), species: previous.species, phaseLabel: previous.phase, quantity: previous.quantity,
        value: r.value ?? previous.value, uncertainty: r.uncertainty ?? previous.uncertainty, unit: previous.unit, source: previous.source,
        expanded: previous.source === 'codata-1989', method: 'evaluated', enteredBy: null, approvedBy: null, item: null, notes: r.notes,
        createdAt: releaseDate(r.release), retiredReason: null, transitionKind: previous.transitionKind ?? null,
      });
    })));
    count('thermo_values', await insertMissing(m, 'thermo_values', REFERENCE_RETIREMENTS.map((r) => {
      const previous = byKey.get(r.retires)!;
      ledger.push({ release: r.release, retireLineage: valueId(r.retires) });
      return valueRow({
        id: valueId(r.key), lineage: valueId(r.retires), version: 2, supersedes: valueId(r.retires), species: previous.species, phaseLabel: previous.phase,
        quantity: previous.quantity, value: previous.value, uncertainty: previous.uncertainty, unit: previous.unit, source: previous.source, expanded: false,
        method: 'evaluated', enteredBy: null, approvedBy: null, item: null, notes: null, createdAt: releaseDate(r.release), retiredReason: r.reason,
        transitionKind: previous.transitionKind ?? null,
      });
    })));

    count('heat_capacity_fits', await insertMissing(m, 'heat_capacity_fits', REFERENCE_FITS.map((f, order) => {
      const id = fitId(f.key);
      ledger.push({ release: f.release, add: { kind: 'fit', id, lineage: id, group: group(f.species, f.phase, 'fit', 'Cp'), priority: SOURCE_PRIORITY[f.source], order, release: f.release, proposalId: null } });
      return {
        id, lineage_id: id, version_no: 1, supersedes_id: null, species_phase_id: phaseId(f.species, f.phase), form: 'nasa7', t_min_k: f.tMin, t_max_k: f.tMax,
        ranges: JSON.stringify(f.ranges), pressure_pa: P_STD, method: 'evaluated', level_of_theory: null, source_id: sourceId(f.source), source_locator: null,
        entered_by: null, approved_by: null, proposal_item_id: null, is_retired: false, retired_reason: null,
        notes: `Reading: ${f.reading}.`, created_at: releaseDate(f.release),
      };
    })));

    await loadProposals(m, userId, count, true);
    await linkItemResults(m);

    // Membership and publication, only for releases this run created.
    let previous: ReleaseLabel | undefined;
    for (const release of RELEASES) {
      if (!existingReleases.has(release.label)) {
        const members = membership(ledger, release.label);
        count('release_members', await insertMissing(m, 'release_members', members.map((v) => ({
          id: seedId('release-member', `${release.label}/${v.lineage}`), release_id: releaseId(release.label),
          value_id: v.kind === 'value' ? v.id : null, fit_id: v.kind === 'fit' ? v.id : null, is_recommended: v.recommended,
          proposal_id: v.release === release.label ? v.proposalId : null, created_at: release.createdAt,
        }))));
        if (release.status === 'published') {
          const changes = await releaseDiff(m, previous ?? null, release.label);
          await publishRelease(m, releaseId(release.label), {
            publishedBy: userId('editor@kelvindex.test'),
            publishedAt: new Date(release.publishedAt),
            changeLog: { comparedWith: previous ?? null, summary: summarizeChanges(changes), changes: changes.map((c) => ({ change: c.change, lineageId: c.lineageId, species: c.hillFormula, name: c.speciesName, phase: c.phase, polymorph: c.polymorph, kind: c.memberKind, quantity: c.quantity })) },
          });
        }
      }
      previous = release.label;
    }

    await loadReviewsAndComments(m, userId, count);
    uploaded = await loadEvidence(m, userId, count, store);
    await loadEngineersRecords(m, userId, count);
    await loadAudit(m, userId, count);

    const result: Record<string, number> = {};
    for (const table of TABLES) result[table] = (await m.query(`SELECT count(*)::int AS n FROM ${table}`))[0].n;
    return result;
  });

  return { durationMs: Math.round(performance.now() - started), inserted, counts, uploaded };
}

async function loadUsers(m: EntityManager, count: (t: string, n: number) => void): Promise<Map<string, string>> {
  const emails = DEMO_ACCOUNTS.map((a) => a.email);
  const present = new Set((await m.query(`SELECT email FROM users WHERE email = ANY($1)`, [emails])).map((r: { email: string }) => r.email));
  const missing = DEMO_ACCOUNTS.filter((a) => !present.has(a.email));
  // bcrypt cost 10, one salt per user; only hashed for users not there yet (the slow part of a first load).
  const rows = await Promise.all(missing.map(async (a) => ({
    id: seedId('user', a.email), email: a.email, display_name: a.name, password_hash: await bcrypt.hash(DEMO_PASSWORD, 10), roles: a.roles,
    email_verified_at: '2026-01-05T09:00:00Z', created_at: '2026-01-05T09:00:00Z',
  })));
  count('users', await insertMissing(m, 'users', rows, '(email)'));
  const found: { id: string; email: string }[] = await m.query(`SELECT id, email FROM users WHERE email = ANY($1)`, [emails]);
  return new Map(found.map((u) => [u.email, u.id]));
}

function speciesRow(s: ReferenceSpecies): Record<string, unknown> {
  const parsed = parseFormula(s.formula);
  return {
    id: speciesId(s.key), formula: s.formula, hill_formula: hillFormula(parsed), charge: parsed.charge, composition: JSON.stringify(parsed.elements),
    molar_mass: molarMass(parsed), name: s.name, synonyms: s.synonyms, inchi: s.inchi ?? null, inchikey: s.inchikey ?? null, cas_rn: s.casRn ?? null,
    smiles: s.smiles ?? null, notes: 'Identifiers entered from memory; CAS check digit verified by the database.', created_at: '2026-01-05T09:00:00Z',
  };
}

function group(species: string, phaseLabel: string, kind: 'value' | 'fit', quantity: Quantity): string {
  return `${phaseId(species, phaseLabel)}|${kind}|${quantity}`;
}

function releaseDate(release: string): string {
  return RELEASES.find((r) => r.label === release)!.createdAt;
}

interface ValueRowInput {
  id: string;
  lineage: string;
  version: number;
  supersedes: string | null;
  species: string;
  phaseLabel: string;
  quantity: Quantity;
  value: string;
  uncertainty?: string;
  unit: 'kJ/mol' | 'J/(mol·K)';
  source: string;
  /** the source's ± is an expanded uncertainty with k = 2 */
  expanded: boolean;
  method: 'evaluated' | 'measured';
  enteredBy: string | null;
  approvedBy: string | null;
  item: string | null;
  notes: string | null;
  createdAt: string;
  retiredReason: string | null;
  transitionKind: string | null;
}

function valueRow(v: ValueRowInput): Record<string, unknown> {
  const power = v.unit === 'kJ/mol' ? 3 : 0;
  const hasUncertainty = v.uncertainty !== undefined;
  const uncertaintySi = hasUncertainty ? scaledDecimal(v.uncertainty!, power) : null;
  const expanded = hasUncertainty && v.expanded && uncertaintySi !== 0;
  return {
    id: v.id, lineage_id: v.lineage, version_no: v.version, supersedes_id: v.supersedes, species_phase_id: phaseId(v.species, v.phaseLabel),
    quantity: v.quantity, transition_kind: v.transitionKind, transition_label: null, value_si: scaledDecimal(v.value, power),
    uncertainty_si: uncertaintySi, uncertainty_kind: hasUncertainty ? (expanded ? 'expanded' : 'standard') : null, coverage_factor: expanded ? 2 : null,
    temperature_k: T_REF, pressure_pa: P_STD, method: v.method, level_of_theory: null, source_id: sourceId(v.source), source_locator: null,
    // A definitional zero is exact (u = 0) but printed without ±.
    entered_value: hasUncertainty && uncertaintySi !== 0 ? `${v.value} ± ${v.uncertainty}` : v.value, entered_unit: v.unit, entered_by: v.enteredBy, approved_by: v.approvedBy,
    proposal_item_id: v.item, is_retired: v.retiredReason !== null, retired_reason: v.retiredReason, notes: v.notes, created_at: v.createdAt,
  };
}

function demoValueRow(v: DemoValue, id: string, by: { enteredBy: string; approvedBy: string | null; item: string; createdAt: string }): Record<string, unknown> {
  return valueRow({
    id, lineage: id, version: 1, supersedes: null, species: v.species, phaseLabel: v.phase, quantity: v.quantity, value: v.value, uncertainty: v.uncertainty,
    unit: v.unit, source: v.source, expanded: true, method: 'measured', enteredBy: by.enteredBy, approvedBy: by.approvedBy, item: by.item,
    notes: 'Invented demo value (Quillmere Process Chemicals scenario): not a measurement, never a check value.', createdAt: by.createdAt,
    retiredReason: null, transitionKind: v.transitionKind ?? null,
  });
}

/**
 * What release `label` holds: the ledger's versions up to and including it (a later version of a
 * lineage replaces the earlier one, a retirement removes the lineage), with the recommended member
 * of each group chosen by source priority (CODATA, then JANAF / NASA, then NBS, then the demo company).
 */
function membership(ledger: LedgerEvent[], label: ReleaseLabel): (Version & { recommended: boolean })[] {
  const upTo = RELEASES.findIndex((r) => r.label === label);
  const current = new Map<string, Version>();
  for (const release of RELEASES.slice(0, upTo + 1)) {
    for (const event of ledger.filter((e) => e.release === release.label)) {
      if (event.add) current.set(event.add.lineage, event.add);
      if (event.retireLineage) current.delete(event.retireLineage);
    }
  }
  const best = new Map<string, Version>();
  for (const v of current.values()) {
    const incumbent = best.get(v.group);
    if (!incumbent || v.priority < incumbent.priority || (v.priority === incumbent.priority && v.order < incumbent.order)) best.set(v.group, v);
  }
  return [...current.values()].map((v) => ({ ...v, recommended: best.get(v.group) === v }));
}

/**
 * Proposals and their items. Items that revise a value refer to a value another proposal created,
 * so they are loaded in a second pass (`withTargets`), after the values.
 */
async function loadProposals(m: EntityManager, userId: (email: string) => string, count: (t: string, n: number) => void, withTargets: boolean): Promise<void> {
  if (!withTargets) {
    count('proposals', await insertMissing(m, 'proposals', DEMO_PROPOSALS.map((p) => ({
      id: proposalId(p.key), title: p.title, summary: p.summary, state: p.state, author_id: userId(p.author),
      release_id: p.release ? releaseId(p.release) : null, submitted_at: p.submittedAt ?? null, decided_at: p.decidedAt ?? null,
      created_at: p.createdAt, updated_at: p.decidedAt ?? p.submittedAt ?? p.createdAt,
    }))));
  }
  count('proposal_items', await insertMissing(m, 'proposal_items', DEMO_PROPOSALS.flatMap((p) => p.items.map((item, index) => ({ p, item, index })))
    .filter(({ item }) => Boolean(item.targetValue) === withTargets)
    .map(({ p, item, index }) => {
    const valueTarget = item.resultValue ?? undefined;
    const species = item.species ?? valueTarget?.species;
    const phase = item.phase ?? valueTarget?.phase;
    return {
      id: itemId(p.key, item.key), proposal_id: proposalId(p.key), position: index + 1, kind: item.kind,
      payload: JSON.stringify(item.targetValue ? { valueId: valueId(item.targetValue), ...item.payload } : item.payload),
      source_id: item.source ? sourceId(item.source) : null,
      species_id: species ? speciesId(species) : null,
      species_phase_id: species && phase ? phaseId(species, phase) : null,
      target_value_id: item.targetValue ? valueId(item.targetValue) : null,
      target_fit_id: null,
      checks: item.checks ? JSON.stringify(item.checks) : null,
      checks_ran_at: item.checks ? p.submittedAt ?? null : null,
      created_at: p.createdAt, updated_at: p.submittedAt ?? p.createdAt,
    };
  })));
}

/** Points the items of approved and released proposals at what they created (once). */
async function linkItemResults(m: EntityManager): Promise<void> {
  for (const p of DEMO_PROPOSALS) {
    for (const item of p.items) {
      const species = item.resultSpecies ?? item.resultValue?.species;
      const phase = item.resultPhase ?? item.resultValue?.phase;
      if (!item.resultSpecies && !item.resultValue) continue;
      await m.query(
        `UPDATE proposal_items SET result_species_id = $2, result_species_phase_id = $3, result_value_id = $4, updated_at = $5
          WHERE id = $1 AND result_species_id IS NULL`,
        [itemId(p.key, item.key), speciesId(species!), phase ? phaseId(species!, phase) : null, item.resultValue ? valueId(item.resultValue.key) : null, p.decidedAt],
      );
    }
  }
}

async function loadReviewsAndComments(m: EntityManager, userId: (email: string) => string, count: (t: string, n: number) => void): Promise<void> {
  count('proposal_reviews', await insertMissing(m, 'proposal_reviews', DEMO_PROPOSALS.flatMap((p) => p.reviews.map((r, index) => ({
    id: seedId('review', `${p.key}/${index}`), proposal_id: proposalId(p.key), reviewer_id: userId(r.reviewer), decision: r.decision, comment: r.comment,
    check_override_justification: r.justification ?? null, proposal_version: 1, created_at: r.at,
  })))));
  count('proposal_comments', await insertMissing(m, 'proposal_comments', DEMO_PROPOSALS.flatMap((p) => p.comments.map((c, index) => ({
    id: seedId('comment', `${p.key}/${index}`), proposal_id: proposalId(p.key), proposal_item_id: c.item ? itemId(p.key, c.item) : null,
    author_id: userId(c.author), body: c.body, created_at: c.at,
  })))));
}

async function loadEvidence(m: EntityManager, userId: (email: string) => string, count: (t: string, n: number) => void, store?: EvidenceStore): Promise<number> {
  const files = DEMO_PROPOSALS.flatMap((p) => p.items.flatMap((item) => (item.evidence ?? []).map((e) => ({ p, item, e }))));
  const rows = files.map(({ p, item, e }) => {
    const bytes = Buffer.from(e.content, 'utf8');
    const id = evidenceId(e.key);
    return {
      row: {
        id, source_id: e.source ? sourceId(e.source) : null, proposal_item_id: itemId(p.key, item.key), file_name: e.fileName, media_type: e.mediaType,
        size_bytes: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex'), object_key: `evidence/${id}/${e.fileName}`,
        description: e.description, uploaded_by: userId(p.author), created_at: p.submittedAt ?? p.createdAt,
      },
      bytes,
    };
  });
  count('evidence_files', await insertMissing(m, 'evidence_files', rows.map((r) => r.row)));
  if (!store) return 0;
  // Same key, same bytes: writing again on a repeated run leaves the store as it was.
  for (const r of rows) await store.put(r.row.object_key, r.bytes, r.row.media_type);
  return rows.length;
}

async function loadEngineersRecords(m: EntityManager, userId: (email: string) => string, count: (t: string, n: number) => void): Promise<void> {
  count('watches', await insertMissing(m, 'watches', DEMO_WATCHES.map((w) => ({
    id: seedId('watch', `${w.user}/${w.species}`), user_id: userId(w.user), species_id: speciesId(w.species), notify_by_email: true, created_at: '2026-06-20T08:00:00Z',
  }))));
  count('saved_reactions', await insertMissing(m, 'saved_reactions', DEMO_SAVED_REACTIONS.map((r) => ({
    id: seedId('saved-reaction', `${r.user}/${r.name}`), user_id: userId(r.user), name: r.name, equation: r.equation, temperatures_k: r.temperaturesK,
    pinned_release_id: r.pinnedRelease ? releaseId(r.pinnedRelease) : null, notes: r.notes ?? null, created_at: '2026-06-20T08:00:00Z', updated_at: '2026-06-20T08:00:00Z',
  }))));
  count('saved_reaction_terms', await insertMissing(m, 'saved_reaction_terms', DEMO_SAVED_REACTIONS.flatMap((r) => r.terms.map(([species, phase, coefficient]) => ({
    id: seedId('saved-reaction-term', `${r.user}/${r.name}/${species}(${phase})`), saved_reaction_id: seedId('saved-reaction', `${r.user}/${r.name}`),
    species_phase_id: phaseId(species, phase), coefficient,
  })))));
  const job = DEMO_IMPORT_JOB;
  count('import_jobs', await insertMissing(m, 'import_jobs', [{
    id: seedId('import-job', job.fileName), created_by: userId(job.user), file_name: job.fileName, format: job.format, dry_run: job.dryRun, status: job.status,
    total_rows: job.totalRows, processed_rows: job.processedRows, error_count: job.errors.length, errors: JSON.stringify(job.errors), object_key: null,
    proposal_id: null, created_at: job.createdAt, started_at: job.createdAt, finished_at: job.createdAt, updated_at: job.createdAt,
  }]));
}

/**
 * A few audit lines telling the scenario's history. The trail is append-only, so each line is
 * keyed by its request id and added only when missing.
 */
async function loadAudit(m: EntityManager, userId: (email: string) => string, count: (t: string, n: number) => void): Promise<void> {
  const entries: { key: string; actor: string; action: string; type: string; id: string; at: string; details: Record<string, unknown> }[] = [];
  for (const release of RELEASES) {
    if (release.status === 'published') {
      entries.push({ key: `release.publish/${release.label}`, actor: 'editor@kelvindex.test', action: 'release.publish', type: 'release', id: releaseId(release.label), at: release.publishedAt, details: { label: release.label } });
    }
  }
  for (const p of DEMO_PROPOSALS) {
    if (p.submittedAt) entries.push({ key: `proposal.submit/${p.key}`, actor: p.author, action: 'proposal.submit', type: 'proposal', id: proposalId(p.key), at: p.submittedAt, details: { title: p.title } });
    p.reviews.forEach((r, index) => entries.push({ key: `proposal.review/${p.key}/${index}`, actor: r.reviewer, action: 'proposal.review', type: 'proposal', id: proposalId(p.key), at: r.at, details: { decision: r.decision } }));
    if (p.state === 'withdrawn') entries.push({ key: `proposal.withdraw/${p.key}`, actor: p.author, action: 'proposal.withdraw', type: 'proposal', id: proposalId(p.key), at: p.decidedAt!, details: {} });
  }
  for (const e of entries) {
    const added: unknown[] = await m.query(
      `INSERT INTO audit_entries (occurred_at, actor_user_id, actor_label, action, entity_type, entity_id, details, request_id)
       SELECT $1, $2, $3, $4, $5, $6, $7, $8
        WHERE NOT EXISTS (SELECT 1 FROM audit_entries WHERE request_id = $8)
       RETURNING 1`,
      [e.at, userId(e.actor), e.actor, e.action, e.type, e.id, JSON.stringify(e.details), `seed:${e.key}`],
    );
    count('audit_entries', added.length);
  }
}

/** The release labels the demo creates, oldest first. */
export const DEMO_RELEASE_LABELS: readonly string[] = RELEASES.map((r) => r.label);
