import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { queryRows } from '../db/returned-rows';
import type { OutgoingMail } from '../mail/mail-queue';
import { sendAfterCommit, workflowMails, type WatchedChange } from '../mail/workflow-messages';
import { transition } from '../proposals/proposal-state-machine';
import { BadRequestError, ConflictError, NotFoundError, UnprocessableError } from '../shared/errors';
import { QUANTITIES, type Quantity } from '../values/value-vocabulary';
import { prepareRelease, publishRelease, putInRelease, recommendMember, removeLineageFromRelease } from './release-assembly';
import { generateChangeLog, type ChangeLogEntry, type ReleaseChangeLog } from './release-change-log';
import { findRelease } from './release-snapshot';

const LABEL = /^[0-9]{4}\.[1-9][0-9]*$/;

/** A release label from the path: `2027.1`; anything else is a 400. */
export function releaseLabel(value: string | string[] | undefined): string {
  const text = Array.isArray(value) ? value[0] : value;
  if (!text || !LABEL.test(text)) throw new BadRequestError(`A release label is the year and a number, e.g. 2027.1; got "${text ?? ''}"`);
  return text;
}

interface ReleaseRow {
  id: string;
  label: string;
  status: 'preparing' | 'published';
  notes: string;
  version: number;
}

/** A species phase and quantity in a release without exactly one recommended member. */
export interface RecommendationGap {
  speciesPhaseId: string;
  memberKind: 'value' | 'fit';
  quantity: Quantity;
  transitionKind: string | null;
  speciesName: string;
  hillFormula: string;
  phase: string;
  polymorph: string | null;
  members: number;
  recommended: number;
}

const compareLabels = (a: string, b: string) => {
  const [ya, na] = a.split('.').map(Number);
  const [yb, nb] = b.split('.').map(Number);
  return ya - yb || na - nb;
};

/**
 * The editor's side of releases: open the next release in preparation (a copy of the latest
 * published one), put approved proposals in, choose recommended values where sources disagree,
 * write notes, publish (then the database freezes it) and tell the watchers what changed.
 */
export class ReleaseEditingService {
  constructor(private readonly ctx: AppContext) {}

  private send(mails: OutgoingMail[]): Promise<void> {
    return sendAfterCommit(this.ctx.mail, mails);
  }


  private async lock(m: EntityManager, label: string): Promise<ReleaseRow> {
    const [row] = await m.query(`SELECT id, label, status, notes, version FROM releases WHERE label = $1 FOR UPDATE`, [label]);
    if (!row) throw new NotFoundError(`No release ${label}`);
    return row;
  }

  private async preparing(m: EntityManager, label: string): Promise<ReleaseRow> {
    const release = await this.lock(m, label);
    if (release.status !== 'preparing') throw new ConflictError(`Release ${label} is published and can no longer change; open the next release instead`, { status: release.status });
    return release;
  }

  async gaps(m: EntityManager, releaseId: string): Promise<RecommendationGap[]> {
    return m.query(
      `SELECT m.species_phase_id AS "speciesPhaseId", m.member_kind AS "memberKind", m.quantity, m.transition_kind AS "transitionKind",
              s.name AS "speciesName", s.hill_formula AS "hillFormula", sp.phase, sp.polymorph,
              count(*)::int AS members, count(*) FILTER (WHERE m.is_recommended)::int AS recommended
         FROM release_members m JOIN species_phases sp ON sp.id = m.species_phase_id JOIN species s ON s.id = sp.species_id
        WHERE m.release_id = $1
        GROUP BY m.species_phase_id, m.member_kind, m.quantity, m.transition_kind, s.name, s.hill_formula, sp.phase, sp.polymorph
       HAVING count(*) FILTER (WHERE m.is_recommended) <> 1
        ORDER BY s.hill_formula, s.name, sp.phase`,
      [releaseId],
    );
  }

  async view(label: string, m: EntityManager = this.ctx.dataSource.manager) {
    const [release] = await m.query(
      `SELECT r.id, r.label, r.status, r.notes, r.created_at AS "createdAt", r.published_at AS "publishedAt", u.display_name AS "publishedBy", r.version,
              (SELECT count(*) FROM release_members WHERE release_id = r.id)::int AS "memberCount"
         FROM releases r LEFT JOIN users u ON u.id = r.published_by WHERE r.label = $1`,
      [label],
    );
    if (!release) throw new NotFoundError(`No release ${label}`);
    const proposals = await m.query(`SELECT id, title, state FROM proposals WHERE release_id = $1 ORDER BY decided_at, id`, [release.id]);
    return {
      ...release,
      proposals,
      needsRecommendation: release.status === 'preparing' ? await this.gaps(m, release.id) : [],
      changeLog: await generateChangeLog(m, label),
    };
  }

  async open(user: Principal, body: { label: string; notes?: string }, req: Request) {
    const label = body.label;
    await this.ctx.dataSource.transaction(async (m) => {
      await m.query(`SELECT pg_advisory_xact_lock(hashtext('kelvindex-releases'))`);
      const all: { label: string; status: string }[] = await m.query(`SELECT label, status FROM releases`);
      if (all.some((r) => r.label === label)) throw new ConflictError(`Release ${label} already exists`, { field: 'label' });
      const preparing = all.find((r) => r.status === 'preparing');
      if (preparing) throw new ConflictError(`Release ${preparing.label} is in preparation; publish it before opening the next one`, { preparing: preparing.label });
      const latest = all.map((r) => r.label).sort(compareLabels).at(-1);
      if (latest && compareLabels(label, latest) <= 0) throw new UnprocessableError(`The next release must come after ${latest}`, { fields: [{ field: 'label', message: `must come after ${latest}` }] });
      const base = await findRelease(m);
      const release = await prepareRelease(m, { label, notes: body.notes?.trim() ?? '', createdBy: user.userId, carryOverFrom: base?.label });
      await recordAudit(m, { action: 'release.open', actor: user, entityType: 'release', entityId: release.id, details: { label, carriedOverFrom: base?.label ?? null } }, req);
    });
    return this.view(label);
  }

  async updateNotes(user: Principal, label: string, notes: string, req: Request) {
    await this.ctx.dataSource.transaction(async (m) => {
      const release = await this.preparing(m, label);
      await m.query(`UPDATE releases SET notes = $2 WHERE id = $1`, [release.id, notes]);
      await recordAudit(m, { action: 'release.notes', actor: user, entityType: 'release', entityId: release.id, details: { label, before: release.notes, after: notes } }, req);
    });
    return this.view(label);
  }

  /**
   * Puts an approved proposal's results into the release in preparation: new values and fits in
   * (recommended when their group has no recommendation yet), revisions in place of the versions
   * they supersede (keeping the recommended flag), retired lineages out, recommendations applied.
   */
  async addProposal(user: Principal, label: string, proposalId: string, req: Request) {
    const { author, title, summary } = await this.ctx.dataSource.transaction(async (m) => {
      const release = await this.preparing(m, label);
      const [p] = await m.query(
        `SELECT p.id, p.title, p.state, p.release_id AS "releaseId", r.label AS "releaseLabel", u.email AS "authorEmail"
           FROM proposals p JOIN users u ON u.id = p.author_id LEFT JOIN releases r ON r.id = p.release_id WHERE p.id = $1 FOR UPDATE OF p`,
        [proposalId],
      );
      if (!p || p.state === 'draft') throw new NotFoundError(`No proposal ${proposalId}`);
      if (p.releaseId) throw new ConflictError(`The proposal is already in release ${p.releaseLabel}`, { release: p.releaseLabel });
      if (p.state !== 'approved') throw new ConflictError(`Only approved proposals go into a release; this one is ${String(p.state).replace('_', ' ')}`, { state: p.state });
      const items: { id: string; kind: string; resultValueId: string | null; resultFitId: string | null; targetValueId: string | null; targetFitId: string | null }[] = await m.query(
        `SELECT id, kind, result_value_id AS "resultValueId", result_fit_id AS "resultFitId", target_value_id AS "targetValueId", target_fit_id AS "targetFitId"
           FROM proposal_items WHERE proposal_id = $1 ORDER BY position`,
        [proposalId],
      );
      const counts = { added: 0, revised: 0, retired: 0, recommended: 0 };
      const notes: string[] = [];
      for (const item of items) {
        if ((item.kind === 'add_value' || item.kind === 'revise_value') && item.resultValueId) {
          await putInRelease(m, release.id, { valueId: item.resultValueId, proposalId, recommended: await this.defaultRecommended(m, release.id, 'value', item.resultValueId) });
          counts[item.kind === 'add_value' ? 'added' : 'revised']++;
        } else if ((item.kind === 'add_fit' || item.kind === 'replace_fit') && item.resultFitId) {
          await putInRelease(m, release.id, { fitId: item.resultFitId, proposalId, recommended: await this.defaultRecommended(m, release.id, 'fit', item.resultFitId) });
          counts[item.kind === 'add_fit' ? 'added' : 'revised']++;
        } else if (item.kind === 'retire_value' && item.resultValueId) {
          const [v] = await m.query(`SELECT lineage_id AS "lineageId" FROM thermo_values WHERE id = $1`, [item.resultValueId]);
          if (await removeLineageFromRelease(m, release.id, v.lineageId)) counts.retired++;
        } else if (item.kind === 'recommend') {
          const table = item.targetFitId ? 'heat_capacity_fits' : 'thermo_values';
          const [member] = await m.query(
            `SELECT m.id FROM release_members m JOIN ${table} t ON t.lineage_id = m.lineage_id WHERE m.release_id = $1 AND t.id = $2`,
            [release.id, item.targetFitId ?? item.targetValueId],
          );
          if (member) {
            await recommendMember(m, member.id);
            counts.recommended++;
          } else {
            notes.push(`item ${item.id}: the value it recommends is not in release ${label}`);
          }
        }
      }
      await m.query(`UPDATE proposals SET release_id = $2 WHERE id = $1`, [proposalId, release.id]);
      await recordAudit(m, { action: 'release.add_proposal', actor: user, entityType: 'release', entityId: release.id, details: { label, proposalId, ...counts, notes } }, req);
      return { author: p.authorEmail as string, title: p.title as string, summary: { ...counts, notes } };
    });
    await this.send([workflowMails.addedToRelease(author, { id: proposalId, title }, label, `${this.ctx.config.appUrl}/proposals/${proposalId}`)]);
    return { ...(await this.view(label)), added: summary };
  }

  /** undefined (keep the flag of the version it replaces) when its lineage is in the release; else recommended when its group has none. */
  private async defaultRecommended(m: EntityManager, releaseId: string, kind: 'value' | 'fit', id: string): Promise<boolean | undefined> {
    const table = kind === 'value' ? 'thermo_values' : 'heat_capacity_fits';
    const [lineage] = await m.query(`SELECT 1 FROM release_members m JOIN ${table} t ON t.lineage_id = m.lineage_id WHERE m.release_id = $1 AND t.id = $2`, [releaseId, id]);
    if (lineage) return undefined;
    const subject = kind === 'value'
      ? `SELECT species_phase_id, quantity, transition_kind FROM thermo_values WHERE id = $2`
      : `SELECT species_phase_id, 'Cp'::text AS quantity, NULL::text AS transition_kind FROM heat_capacity_fits WHERE id = $2`;
    const [recommended] = await m.query(
      `SELECT 1 FROM release_members m, (${subject}) t
        WHERE m.release_id = $1 AND m.is_recommended AND m.member_kind = $3 AND m.species_phase_id = t.species_phase_id
          AND m.quantity = t.quantity AND m.transition_kind IS NOT DISTINCT FROM t.transition_kind`,
      [releaseId, id, kind],
    );
    return !recommended;
  }

  /** Makes a member the recommended one of its species phase and quantity. */
  async recommend(user: Principal, label: string, body: { speciesPhaseId: string; quantity: Quantity; valueId?: string; fitId?: string }, req: Request) {
    if (!body.valueId === !body.fitId) throw new BadRequestError('Give exactly one of valueId and fitId');
    if (!(QUANTITIES as readonly string[]).includes(body.quantity)) throw new BadRequestError(`quantity must be one of ${QUANTITIES.join(', ')}`);
    const group = await this.ctx.dataSource.transaction(async (m) => {
      const release = await this.preparing(m, label);
      const [member] = await m.query(
        `SELECT id, species_phase_id AS "speciesPhaseId", quantity, member_kind AS "memberKind", transition_kind AS "transitionKind", is_recommended AS "isRecommended"
           FROM release_members WHERE release_id = $1 AND ${body.valueId ? 'value_id' : 'fit_id'} = $2`,
        [release.id, body.valueId ?? body.fitId],
      );
      if (!member) throw new UnprocessableError(`${body.valueId ? `Value ${body.valueId}` : `Fit ${body.fitId}`} is not in release ${label}`, { fields: [{ field: body.valueId ? 'valueId' : 'fitId', message: 'not a member of the release' }] });
      if (member.speciesPhaseId !== body.speciesPhaseId || member.quantity !== body.quantity) {
        throw new UnprocessableError(`That ${member.memberKind} is ${member.quantity} of species phase ${member.speciesPhaseId}, not ${body.quantity} of ${body.speciesPhaseId}`);
      }
      if (!member.isRecommended) await recommendMember(m, member.id);
      await recordAudit(m, { action: 'release.recommend', actor: user, entityType: 'release', entityId: release.id, details: { label, ...body } }, req);
      return m.query(
        `SELECT m.value_id AS "valueId", m.fit_id AS "fitId", m.is_recommended AS recommended, s.short_key AS "sourceKey",
                v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi", v.entered_value AS "enteredValue", v.entered_unit AS "enteredUnit"
           FROM release_members m
           LEFT JOIN thermo_values v ON v.id = m.value_id
           LEFT JOIN heat_capacity_fits f ON f.id = m.fit_id
           JOIN sources s ON s.id = coalesce(v.source_id, f.source_id)
          WHERE m.release_id = $1 AND m.species_phase_id = $2 AND m.member_kind = $3 AND m.quantity = $4 AND m.transition_kind IS NOT DISTINCT FROM $5
          ORDER BY m.is_recommended DESC, s.short_key`,
        [release.id, member.speciesPhaseId, member.memberKind, member.quantity, member.transitionKind],
      );
    });
    return { release: label, speciesPhaseId: body.speciesPhaseId, quantity: body.quantity, members: group };
  }

  /**
   * Publishes the release: every species phase and quantity must have one recommended member;
   * the change log is generated and frozen with it; its approved proposals become released.
   * Then each watcher of a changed species gets one e-mail listing what changed for them.
   */
  async publish(user: Principal, label: string, version: number | undefined, req: Request) {
    const { changeLog, proposals } = await this.ctx.dataSource.transaction(async (m) => {
      const release = await this.preparing(m, label);
      if (version !== undefined && version !== release.version) {
        throw new ConflictError(`Release ${label} changed since you loaded it (version ${version}, now ${release.version}); review it again`, { currentVersion: release.version });
      }
      const gaps = await this.gaps(m, release.id);
      if (gaps.length > 0) {
        throw new ConflictError(`${gaps.length} species phase${gaps.length === 1 ? '' : 's'} and quantit${gaps.length === 1 ? 'y' : 'ies'} in ${label} need exactly one recommended value first: ${gaps.slice(0, 5).map((g) => `${g.quantity} of ${g.speciesName} (${g.phase}${g.polymorph ? `, ${g.polymorph}` : ''})`).join('; ')}`, { needsRecommendation: gaps });
      }
      const changeLog = await generateChangeLog(m, label);
      const proposals: { id: string; title: string; state: 'approved'; authorEmail: string }[] = await m.query(
        `SELECT p.id, p.title, p.state, u.email AS "authorEmail" FROM proposals p JOIN users u ON u.id = p.author_id
          WHERE p.release_id = $1 AND p.state = 'approved' ORDER BY p.id FOR UPDATE OF p`,
        [release.id],
      );
      for (const p of proposals) {
        const step = transition(p.state, 'release');
        if (!step.ok) throw new ConflictError(step.reason);
      }
      await publishRelease(m, release.id, { publishedBy: user.userId, changeLog: changeLog as unknown as Record<string, unknown> });
      await queryRows(m, `UPDATE proposals SET state = 'released' WHERE release_id = $1 AND state = 'approved' RETURNING id`, [release.id]);
      await recordAudit(m, { action: 'release.publish', actor: user, entityType: 'release', entityId: release.id, details: { label, summary: changeLog.summary, proposals: proposals.map((p) => p.id) } }, req);
      for (const p of proposals) {
        await recordAudit(m, { action: 'proposal.release', actor: user, entityType: 'proposal', entityId: p.id, details: { from: 'approved', to: 'released', release: label } }, req);
      }
      return { changeLog, proposals };
    });
    const link = `${this.ctx.config.appUrl}/releases/${label}`;
    await this.send([
      ...(await this.watcherMails(changeLog, link)),
      ...proposals.map((p) => workflowMails.released(p.authorEmail, p, label, `${this.ctx.config.appUrl}/proposals/${p.id}`)),
    ]);
    return this.view(label);
  }

  /** One e-mail per watcher of a changed species, listing that species' changes. */
  private async watcherMails(changeLog: ReleaseChangeLog, link: string): Promise<OutgoingMail[]> {
    if (changeLog.species.length === 0) return [];
    const watches: { email: string; speciesId: string }[] = await this.ctx.dataSource.query(
      `SELECT u.email, w.species_id AS "speciesId" FROM watches w JOIN users u ON u.id = w.user_id
        WHERE w.notify_by_email AND u.deactivated_at IS NULL AND w.species_id = ANY($1::uuid[]) ORDER BY u.email`,
      [changeLog.species.map((s) => s.speciesId)],
    );
    const byUser = new Map<string, string[]>();
    for (const w of watches) byUser.set(w.email, [...(byUser.get(w.email) ?? []), w.speciesId]);
    return [...byUser].map(([email, speciesIds]) => workflowMails.watchedSpeciesChanged(
      email,
      changeLog.release,
      changeLog.species.filter((s) => speciesIds.includes(s.speciesId)).map((s) => ({
        name: s.name,
        formula: s.hillFormula,
        changes: [...s.added, ...s.revised, ...s.retired, ...s.removed, ...s.recommendation].map(describeChange),
      })),
      link,
    ));
  }
}

function describeChange(entry: ChangeLogEntry): WatchedChange {
  const version = (v: ChangeLogEntry['from']) => (v ? `${v.entered} (${v.sourceKey})` : '—');
  switch (entry.change) {
    case 'added':
      return { change: 'added', what: entry.label, detail: `${version(entry.to)}${entry.to?.recommended ? ', recommended' : ''}` };
    case 'revised':
      return { change: 'revised', what: entry.label, detail: `${version(entry.from)} → ${version(entry.to)}` };
    case 'retired':
    case 'removed':
      return { change: entry.change, what: entry.label, detail: `${version(entry.from)} is no longer in the release` };
    case 'recommendation':
      return { change: entry.to?.recommended ? 'now recommended' : 'no longer recommended', what: entry.label, detail: version(entry.to) };
  }
}
