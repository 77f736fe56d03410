import type { Request } from 'express';
import type { DataSource, EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { queryRows } from '../db/returned-rows';
import { sendAfterCommit, workflowMails } from '../mail/workflow-messages';
import type { OutgoingMail } from '../mail/mail-queue';
import { ConflictError, ForbiddenError, HttpError, NotFoundError, UnprocessableError } from '../shared/errors';
import { canSeeProposal, seesSubmittedProposals } from './proposal-access';
import { applyProposal } from './proposal-apply';
import { hasFailedCheck, runChecks } from './proposal-checks';
import { PROPOSAL_EVENTS, actorRefusal, decisionEvent, itemsEditable, transition, type ProposalEvent } from './proposal-state-machine';
import { CatalogueView, itemColumns, referencedIds, resolveItems, withColumnReferences, type ItemInput, type ItemReferenceColumns, type ResolvedItem } from './proposal-subjects';
import type { ProposalItemKind, ProposalState, ReviewDecision, StoredCheckResult } from './proposal-vocabulary';

/** A proposal row as the workflow reads it. */
export interface ProposalRow {
  id: string;
  title: string;
  summary: string;
  state: ProposalState;
  authorId: string;
  authorName: string;
  authorEmail: string;
  releaseId: string | null;
  releaseLabel: string | null;
  submittedAt: Date | null;
  decidedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export interface ProposalListFilter {
  states?: ProposalState[];
  mine?: boolean;
  assignedToMe?: boolean;
  sort: string;
  limit: number;
  offset: number;
}

export const PROPOSAL_SORTS: Readonly<Record<string, string>> = {
  updatedAt: 'p.updated_at ASC, p.id',
  '-updatedAt': 'p.updated_at DESC, p.id',
  createdAt: 'p.created_at ASC, p.id',
  '-createdAt': 'p.created_at DESC, p.id',
  submittedAt: 'p.submitted_at ASC NULLS LAST, p.id',
  '-submittedAt': 'p.submitted_at DESC NULLS LAST, p.id',
  title: 'lower(p.title) ASC, p.id',
  '-title': 'lower(p.title) DESC, p.id',
};

const PROPOSAL_COLUMNS = `p.id, p.title, p.summary, p.state, p.author_id AS "authorId", u.display_name AS "authorName", u.email AS "authorEmail",
  p.release_id AS "releaseId", r.label AS "releaseLabel", p.submitted_at AS "submittedAt", p.decided_at AS "decidedAt",
  p.created_at AS "createdAt", p.updated_at AS "updatedAt", p.version`;
const PROPOSAL_FROM = `proposals p JOIN users u ON u.id = p.author_id LEFT JOIN releases r ON r.id = p.release_id`;

const ITEM_COLUMNS = `i.id, i.position, i.kind, i.payload, i.source_id AS "sourceId", i.species_id AS "speciesId", i.species_phase_id AS "speciesPhaseId",
  i.target_value_id AS "targetValueId", i.target_fit_id AS "targetFitId", i.result_species_id AS "resultSpeciesId",
  i.result_species_phase_id AS "resultSpeciesPhaseId", i.result_value_id AS "resultValueId", i.result_fit_id AS "resultFitId",
  i.checks, i.checks_ran_at AS "checksRanAt", i.created_at AS "createdAt", i.updated_at AS "updatedAt"`;

const CHUNK = 5000;

/** pass / warn / fail counts of stored check results. */
export function checkSummary(lists: (StoredCheckResult[] | null)[]): { pass: number; warn: number; fail: number } {
  const summary = { pass: 0, warn: 0, fail: 0 };
  for (const list of lists) for (const c of list ?? []) summary[c.status]++;
  return summary;
}

/**
 * The editorial workflow's use cases on proposals: drafting items, the transitions of the state
 * machine (each in one transaction with the proposal row locked, audited, refused attempts
 * audited too), reviews with optimistic locking, comments, and e-mail to the people concerned.
 */
export class ProposalsService {
  private readonly ds: DataSource;

  constructor(private readonly ctx: AppContext) {
    this.ds = ctx.dataSource;
  }

  private link(id: string): string {
    return `${this.ctx.config.appUrl}/proposals/${id}`;
  }

  /** Sends after the transaction committed; a mail queue problem never undoes a transition. */
  private send(mails: OutgoingMail[]): Promise<void> {
    return sendAfterCommit(this.ctx.mail, mails);
  }


  async find(manager: EntityManager, id: string, options: { lock?: boolean } = {}): Promise<ProposalRow | undefined> {
    if (options.lock) await manager.query(`SELECT 1 FROM proposals WHERE id = $1 FOR UPDATE`, [id]);
    const [row] = await manager.query(`SELECT ${PROPOSAL_COLUMNS} FROM ${PROPOSAL_FROM} WHERE p.id = $1`, [id]);
    return row;
  }

  /** The proposal if this user may see it; 404 otherwise (a draft is nobody else's business). */
  async findVisible(manager: EntityManager, id: string, user: Principal, options: { lock?: boolean } = {}): Promise<ProposalRow> {
    const p = await this.find(manager, id, options);
    if (!p || !canSeeProposal(p, user)) throw new NotFoundError(`No proposal ${id}`);
    return p;
  }

  async list(user: Principal, filter: ProposalListFilter) {
    const params: unknown[] = [user.userId];
    const where: string[] = [seesSubmittedProposals(user) ? `(p.author_id = $1 OR p.state <> 'draft')` : `p.author_id = $1`];
    if (filter.states?.length) {
      params.push(filter.states);
      where.push(`p.state = ANY($${params.length}::text[])`);
    }
    if (filter.mine) where.push('p.author_id = $1');
    if (filter.assignedToMe) {
      // "Waiting for me": a reviewer's queue, an author's proposals sent back, an editor's approved work not yet in a release.
      const queue: string[] = [];
      if (user.roles.includes('reviewer')) queue.push(`(p.state IN ('submitted', 'in_review', 'resubmitted') AND p.author_id <> $1)`);
      if (user.roles.includes('steward')) queue.push(`(p.author_id = $1 AND p.state IN ('draft', 'changes_requested'))`);
      if (user.roles.includes('editor')) queue.push(`(p.state = 'approved' AND p.release_id IS NULL)`);
      where.push(queue.length ? `(${queue.join(' OR ')})` : 'false');
    }
    const whereSql = where.join(' AND ');
    const [{ total }] = await this.ds.query(`SELECT count(*)::int AS total FROM proposals p WHERE ${whereSql}`, params);
    params.push(filter.limit, filter.offset);
    const rows: (ProposalRow & { itemCount: number; failedChecks: number })[] = await this.ds.query(
      `SELECT ${PROPOSAL_COLUMNS},
              (SELECT count(*) FROM proposal_items i WHERE i.proposal_id = p.id)::int AS "itemCount",
              (SELECT count(*) FROM proposal_items i CROSS JOIN LATERAL jsonb_array_elements(coalesce(i.checks, '[]'::jsonb)) c
                WHERE i.proposal_id = p.id AND c->>'status' = 'fail')::int AS "failedChecks"
         FROM ${PROPOSAL_FROM}
        WHERE ${whereSql}
        ORDER BY ${PROPOSAL_SORTS[filter.sort]}
        LIMIT $${params.length - 1} OFFSET $${params.length}`,
      params,
    );
    return { items: rows.map((r) => ({ ...this.summaryView(r), itemCount: r.itemCount, failedChecks: r.failedChecks })), total, limit: filter.limit, offset: filter.offset };
  }

  private summaryView(p: ProposalRow) {
    return {
      id: p.id, title: p.title, summary: p.summary, state: p.state, version: p.version,
      author: { id: p.authorId, name: p.authorName },
      release: p.releaseId ? { id: p.releaseId, label: p.releaseLabel } : null,
      submittedAt: p.submittedAt, decidedAt: p.decidedAt, createdAt: p.createdAt, updatedAt: p.updatedAt,
    };
  }

  async create(user: Principal, body: { title: string; summary?: string }, req: Request) {
    const id = await this.ds.transaction(async (m) => {
      const [row] = await m.query(`INSERT INTO proposals (title, summary, author_id) VALUES ($1, $2, $3) RETURNING id`, [body.title.trim(), body.summary?.trim() ?? '', user.userId]);
      await recordAudit(m, { action: 'proposal.create', actor: user, entityType: 'proposal', entityId: row.id, details: { title: body.title } }, req);
      return row.id as string;
    });
    return this.get(user, id);
  }

  async get(user: Principal, id: string, page: { offset: number; limit: number } = { offset: 0, limit: 500 }) {
    const m = this.ds.manager;
    const p = await this.findVisible(m, id, user);
    const items = await m.query(
      `SELECT ${ITEM_COLUMNS}, s.short_key AS "sourceKey", s.title AS "sourceTitle"
         FROM proposal_items i LEFT JOIN sources s ON s.id = i.source_id
        WHERE i.proposal_id = $1 ORDER BY i.position LIMIT $2 OFFSET $3`,
      [id, page.limit, page.offset],
    );
    const [counts] = await m.query(
      `SELECT count(*) FILTER (WHERE c->>'status' = 'pass')::int AS pass, count(*) FILTER (WHERE c->>'status' = 'warn')::int AS warn,
              count(*) FILTER (WHERE c->>'status' = 'fail')::int AS fail
         FROM proposal_items i LEFT JOIN LATERAL jsonb_array_elements(coalesce(i.checks, '[]'::jsonb)) c ON true
        WHERE i.proposal_id = $1`,
      [id],
    );
    const evidence: Record<string, unknown>[] = items.length === 0 ? [] : await m.query(
      `SELECT id, proposal_item_id AS "itemId", file_name AS "fileName", media_type AS "mediaType", size_bytes::float8 AS "sizeBytes", sha256, description, created_at AS "createdAt"
         FROM evidence_files WHERE proposal_item_id = ANY($1::uuid[]) ORDER BY created_at`,
      [items.map((i: { id: string }) => i.id)],
    );
    const reviews = await m.query(
      `SELECT rv.id, rv.reviewer_id AS "reviewerId", u.display_name AS "reviewerName", rv.decision, rv.comment,
              rv.check_override_justification AS justification, rv.proposal_version AS "proposalVersion", rv.created_at AS "createdAt"
         FROM proposal_reviews rv JOIN users u ON u.id = rv.reviewer_id WHERE rv.proposal_id = $1 ORDER BY rv.created_at`,
      [id],
    );
    return {
      ...this.summaryView(p),
      itemCount: (await m.query(`SELECT count(*)::int AS n FROM proposal_items WHERE proposal_id = $1`, [id]))[0].n as number,
      checkSummary: { pass: counts.pass, warn: counts.warn, fail: counts.fail },
      allowedActions: this.allowedActions(p, user),
      items: items.map((i: Record<string, unknown>) => {
        const { sourceKey, sourceTitle, ...rest } = i;
        return {
          ...rest,
          source: i.sourceId ? { id: i.sourceId, shortKey: sourceKey, title: sourceTitle } : null,
          checkSummary: checkSummary([i.checks as StoredCheckResult[] | null]),
          evidence: evidence.filter((e) => e.itemId === i.id).map(({ itemId: _itemId, ...e }) => e),
        };
      }),
      itemsPage: { offset: page.offset, limit: page.limit },
      reviews: reviews.map((r: Record<string, unknown>) => ({
        id: r.id, reviewer: { id: r.reviewerId, name: r.reviewerName }, decision: r.decision, comment: r.comment,
        justification: r.justification, proposalVersion: r.proposalVersion, createdAt: r.createdAt,
      })),
    };
  }

  /** What this user can do with the proposal now (the client shows only these buttons). */
  allowedActions(p: Pick<ProposalRow, 'authorId' | 'state' | 'releaseId'>, user: Principal): string[] {
    const who = { isAuthor: p.authorId === user.userId, roles: user.roles };
    const actions: string[] = PROPOSAL_EVENTS.filter((e) => e !== 'release' && e !== 'start_review' && transition(p.state, e).ok && !actorRefusal(e, who));
    if (who.isAuthor && itemsEditable(p.state)) actions.push('edit_items');
    if (p.state === 'approved' && !p.releaseId && user.roles.includes('editor')) actions.push('add_to_release');
    return actions;
  }

  // ── items ────────────────────────────────────────────────────────────────────────────────

  private async loadItems(m: EntityManager, proposalId: string): Promise<ItemInput[]> {
    const rows: (ItemInput & ItemReferenceColumns)[] = await m.query(
      `SELECT id, position, kind, payload, source_id AS "sourceId", species_id AS "speciesId", species_phase_id AS "speciesPhaseId",
              target_value_id AS "targetValueId", target_fit_id AS "targetFitId"
         FROM proposal_items WHERE proposal_id = $1 ORDER BY position`,
      [proposalId],
    );
    return rows.map(({ speciesId, speciesPhaseId, targetValueId, targetFitId, ...item }) => withColumnReferences(item, { speciesId, speciesPhaseId, targetValueId, targetFitId }));
  }

  /** Locks the proposal for an item change by its author while items may change. */
  private async editable(m: EntityManager, id: string, user: Principal): Promise<ProposalRow> {
    const p = await this.findVisible(m, id, user, { lock: true });
    if (p.authorId !== user.userId) throw new ForbiddenError('Only the author of a proposal can change its items');
    if (!itemsEditable(p.state)) {
      throw new ConflictError(`Items can be changed in a draft or after a request for changes; this proposal is ${p.state.replace('_', ' ')}`, { state: p.state });
    }
    return p;
  }

  private async requireSource(m: EntityManager, sourceId: string | null | undefined): Promise<void> {
    if (!sourceId) return;
    const [row] = await m.query(`SELECT 1 FROM sources WHERE id = $1`, [sourceId]);
    if (!row) throw new UnprocessableError(`No source ${sourceId}`, { fields: [{ field: 'sourceId', message: `no source ${sourceId}` }] });
  }

  private async resolveWith(m: EntityManager, items: ItemInput[]): Promise<ResolvedItem[]> {
    const catalogue = await CatalogueView.load(m, referencedIds(items));
    return resolveItems(items, catalogue);
  }

  private static refuseProblems(resolved: ResolvedItem | undefined): void {
    if (resolved && resolved.problems.length > 0) {
      throw new UnprocessableError(`The item is not valid: ${resolved.problems.map((p) => p.message).join('; ')}`, { fields: resolved.problems });
    }
  }

  async addItem(user: Principal, id: string, body: { kind: ProposalItemKind; payload: Record<string, unknown>; sourceId?: string | null }, req: Request) {
    const itemId = await this.ds.transaction(async (m) => {
      await this.editable(m, id, user);
      await this.requireSource(m, body.sourceId);
      const items = await this.loadItems(m, id);
      const position = items.reduce((max, i) => Math.max(max, i.position), 0) + 1;
      const [{ id: newId }] = await m.query(`SELECT gen_random_uuid() AS id`);
      const candidate: ItemInput = { id: newId, position, kind: body.kind, payload: body.payload, sourceId: body.sourceId ?? null };
      const resolved = (await this.resolveWith(m, [...items, candidate])).find((r) => r.item.id === newId);
      ProposalsService.refuseProblems(resolved);
      const cols = itemColumns(resolved!);
      await m.query(
        `INSERT INTO proposal_items (id, proposal_id, position, kind, payload, source_id, species_id, species_phase_id, target_value_id, target_fit_id)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10)`,
        [newId, id, position, body.kind, JSON.stringify(body.payload), body.sourceId ?? null, cols.speciesId, cols.speciesPhaseId, cols.targetValueId, cols.targetFitId],
      );
      await m.query(`UPDATE proposals SET updated_at = now() WHERE id = $1`, [id]);
      await recordAudit(m, { action: 'proposal.item_add', actor: user, entityType: 'proposal', entityId: id, details: { itemId: newId, kind: body.kind, position } }, req);
      return newId as string;
    });
    return this.item(id, itemId);
  }

  async updateItem(user: Principal, id: string, itemId: string, body: { payload?: Record<string, unknown>; sourceId?: string | null }, req: Request) {
    await this.ds.transaction(async (m) => {
      await this.editable(m, id, user);
      const items = await this.loadItems(m, id);
      const current = items.find((i) => i.id === itemId);
      if (!current) throw new NotFoundError(`No item ${itemId} in proposal ${id}`);
      if (body.sourceId !== undefined) await this.requireSource(m, body.sourceId);
      const changed: ItemInput = { ...current, payload: body.payload ?? current.payload, sourceId: body.sourceId === undefined ? current.sourceId : body.sourceId };
      const resolved = (await this.resolveWith(m, items.map((i) => (i.id === itemId ? changed : i)))).find((r) => r.item.id === itemId);
      ProposalsService.refuseProblems(resolved);
      const cols = itemColumns(resolved!);
      // Checks ran on the old content; they run again at the next submission.
      await m.query(
        `UPDATE proposal_items SET payload = $2, source_id = $3, species_id = $4, species_phase_id = $5, target_value_id = $6, target_fit_id = $7,
                checks = NULL, checks_ran_at = NULL
          WHERE id = $1`,
        [itemId, JSON.stringify(changed.payload), changed.sourceId, cols.speciesId, cols.speciesPhaseId, cols.targetValueId, cols.targetFitId],
      );
      await m.query(`UPDATE proposals SET updated_at = now() WHERE id = $1`, [id]);
      await recordAudit(m, { action: 'proposal.item_update', actor: user, entityType: 'proposal', entityId: id, details: { itemId, before: { payload: current.payload, sourceId: current.sourceId }, after: { payload: changed.payload, sourceId: changed.sourceId } } }, req);
    });
    return this.item(id, itemId);
  }

  async deleteItem(user: Principal, id: string, itemId: string, req: Request): Promise<void> {
    await this.ds.transaction(async (m) => {
      await this.editable(m, id, user);
      const [item] = await m.query(`SELECT kind, payload FROM proposal_items WHERE id = $1 AND proposal_id = $2`, [itemId, id]);
      if (!item) throw new NotFoundError(`No item ${itemId} in proposal ${id}`);
      // The evidence rows go with the item; the bytes stay in the object store (nothing there is overwritten or lost).
      const evidence = await queryRows(m, `DELETE FROM evidence_files WHERE proposal_item_id = $1 RETURNING id, object_key AS "objectKey"`, [itemId]);
      await m.query(`DELETE FROM proposal_items WHERE id = $1`, [itemId]);
      await m.query(`UPDATE proposals SET updated_at = now() WHERE id = $1`, [id]);
      await recordAudit(m, { action: 'proposal.item_delete', actor: user, entityType: 'proposal', entityId: id, details: { itemId, kind: item.kind, payload: item.payload, evidence } }, req);
    });
  }

  private async item(proposalId: string, itemId: string) {
    const [row] = await this.ds.query(`SELECT ${ITEM_COLUMNS} FROM proposal_items i WHERE i.id = $1 AND i.proposal_id = $2`, [itemId, proposalId]);
    if (!row) throw new NotFoundError(`No item ${itemId} in proposal ${proposalId}`);
    return row;
  }

  // ── transitions ──────────────────────────────────────────────────────────────────────────

  /**
   * One transition: lock the row, check who may, the version the caller saw and the state
   * machine, do the event's work, move the state, audit. A refused attempt is audited as well,
   * outside the rolled-back transaction, so the trail holds every attempt.
   */
  private async move<T>(
    user: Principal,
    id: string,
    event: ProposalEvent,
    req: Request,
    options: { version?: number; auditAction?: string; details?: Record<string, unknown>; work?: (m: EntityManager, p: ProposalRow) => Promise<T> },
  ): Promise<{ proposal: ProposalRow; result: T | undefined }> {
    const action = options.auditAction ?? `proposal.${event}`;
    try {
      return await this.ds.transaction(async (m) => {
        const p = await this.findVisible(m, id, user, { lock: true });
        const refusal = actorRefusal(event, { isAuthor: p.authorId === user.userId, roles: user.roles });
        if (refusal) throw new ForbiddenError(refusal);
        if (options.version !== undefined && options.version !== p.version) {
          throw new ConflictError(`The proposal changed since you loaded it (you saw version ${options.version}, it is now at version ${p.version}, ${p.state.replace('_', ' ')}); reload it and decide again`, { currentVersion: p.version, state: p.state });
        }
        const step = transition(p.state, event);
        if (!step.ok) throw new ConflictError(step.reason, { state: p.state });
        const result = options.work ? await options.work(m, p) : undefined;
        const updated = await queryRows<{ version: number }>(
          m,
          `UPDATE proposals
              SET state = $3,
                  submitted_at = CASE WHEN $3 IN ('submitted', 'resubmitted') THEN now() ELSE submitted_at END,
                  decided_at = CASE WHEN $3 IN ('approved', 'rejected', 'withdrawn') THEN now() ELSE decided_at END
            WHERE id = $1 AND version = $2
            RETURNING version`,
          [id, p.version, step.to],
        );
        if (updated.length !== 1) throw new ConflictError('Someone else changed the proposal at the same moment; reload it');
        await recordAudit(m, { action, actor: user, entityType: 'proposal', entityId: id, details: { from: p.state, to: step.to, version: updated[0].version, ...options.details } }, req);
        return { proposal: { ...p, state: step.to, version: updated[0].version }, result };
      });
    } catch (error) {
      const refused = error instanceof HttpError ? error : undefined;
      if (refused && [403, 409, 422].includes(refused.status)) {
        await recordAudit(this.ds.manager, {
          action: `${action}_refused`, actor: user, entityType: 'proposal', entityId: id,
          details: { event, status: refused.status, reason: refused.message, version: options.version ?? null, ...options.details },
        }, req).catch((e: Error) => console.error(`audit of a refused ${event} failed: ${e.message}`));
      }
      throw error;
    }
  }

  /** Validates every item, stores resolved references and the consistency checks' results. */
  private async prepareForReview(m: EntityManager, p: ProposalRow): Promise<{ items: number; failed: number }> {
    const items = await this.loadItems(m, p.id);
    if (items.length === 0) throw new UnprocessableError('A proposal needs at least one item before it can be submitted');
    const resolved = await this.resolveWith(m, items);
    const problems = resolved.flatMap((r) => r.problems.map((x) => ({ itemId: r.item.id, position: r.item.position, kind: r.item.kind, ...x })));
    if (problems.length > 0) {
      throw new UnprocessableError(`${problems.length} problem${problems.length === 1 ? '' : 's'} in the items must be fixed first: ${problems.slice(0, 5).map((x) => `item ${x.position}: ${x.message}`).join('; ')}${problems.length > 5 ? '; …' : ''}`, { problems });
    }
    const checks = await runChecks(m, p.id, resolved);
    const rows = resolved.map((r) => ({ id: r.item.id, ...snake(itemColumns(r)), checks: checks.get(r.item.id) ?? [] }));
    for (let i = 0; i < rows.length; i += CHUNK) {
      await m.query(
        `UPDATE proposal_items i
            SET species_id = x.species_id, species_phase_id = x.species_phase_id, target_value_id = x.target_value_id, target_fit_id = x.target_fit_id,
                checks = x.checks, checks_ran_at = now()
           FROM jsonb_to_recordset($1::jsonb) AS x(id uuid, species_id uuid, species_phase_id uuid, target_value_id uuid, target_fit_id uuid, checks jsonb)
          WHERE i.id = x.id`,
        [JSON.stringify(rows.slice(i, i + CHUNK))],
      );
    }
    return { items: items.length, failed: rows.filter((r) => r.checks.some((c) => c.status === 'fail')).length };
  }

  async submit(user: Principal, id: string, version: number | undefined, req: Request, event: 'submit' | 'resubmit' = 'submit') {
    const { proposal, result } = await this.move(user, id, event, req, { version, work: (m, p) => this.prepareForReview(m, p) });
    const reviewers: { email: string }[] = await this.ds.query(
      `SELECT email FROM users WHERE 'reviewer' = ANY(roles) AND deactivated_at IS NULL AND id <> $1 ORDER BY email`,
      [proposal.authorId],
    );
    await this.send(reviewers.map((r) => workflowMails.submitted(r.email, proposal, proposal.authorName, this.link(id), event === 'resubmit')));
    return { ...(await this.get(user, id)), checksRun: result };
  }

  async withdraw(user: Principal, id: string, version: number | undefined, req: Request) {
    const { proposal } = await this.move(user, id, 'withdraw', req, { version });
    const involved: { email: string }[] = await this.ds.query(
      `SELECT DISTINCT u.email FROM users u
        WHERE u.id <> $2 AND (u.id IN (SELECT reviewer_id FROM proposal_reviews WHERE proposal_id = $1)
                              OR u.id IN (SELECT author_id FROM proposal_comments WHERE proposal_id = $1))`,
      [id, proposal.authorId],
    );
    await this.send(involved.map((u) => workflowMails.withdrawn(u.email, proposal, proposal.authorName, this.link(id))));
    return this.get(user, id);
  }

  async review(user: Principal, id: string, body: { decision: ReviewDecision; comment?: string; justification?: string; version: number }, req: Request) {
    const comment = body.comment?.trim() ?? '';
    const justification = body.justification?.trim() || null;
    const { proposal } = await this.move(user, id, decisionEvent(body.decision), req, {
      version: body.version,
      auditAction: 'proposal.review',
      details: { decision: body.decision },
      work: async (m, p) => {
        if (body.decision !== 'approve' && comment === '') {
          throw new UnprocessableError(`Say what ${body.decision === 'reject' ? 'is wrong' : 'should change'} in a comment`, { fields: [{ field: 'comment', message: 'comment is required for this decision' }] });
        }
        if (body.decision === 'approve') {
          const items = await this.loadItems(m, p.id);
          const stored: { id: string; position: number; checks: StoredCheckResult[] | null }[] = await m.query(
            `SELECT id, position, checks FROM proposal_items WHERE proposal_id = $1 ORDER BY position`, [p.id]);
          if (hasFailedCheck(stored.map((s) => s.checks)) && !justification) {
            const failed = stored.flatMap((s) => (s.checks ?? []).filter((c) => c.status === 'fail').map((c) => ({ itemId: s.id, position: s.position, code: c.code, message: c.message })));
            throw new UnprocessableError(`${failed.length} automatic check${failed.length === 1 ? '' : 's'} failed; approving needs a justification`, { failed });
          }
          const resolved = await this.resolveWith(m, items);
          await applyProposal(m, resolved, { authorId: p.authorId, reviewerId: user.userId });
        }
        await m.query(
          `INSERT INTO proposal_reviews (proposal_id, reviewer_id, decision, comment, check_override_justification, proposal_version) VALUES ($1, $2, $3, $4, $5, $6)`,
          [p.id, user.userId, body.decision, comment, justification, body.version],
        );
      },
    });
    await this.send([workflowMails.decided(proposal.authorEmail, proposal, user.name, body.decision, comment, this.link(id))]);
    return this.get(user, id);
  }

  // ── comments ────────────────────────────────────────────────────────────────────────────

  async comments(user: Principal, id: string) {
    await this.findVisible(this.ds.manager, id, user);
    const rows = await this.ds.query(
      `SELECT c.id, c.proposal_item_id AS "itemId", c.author_id AS "authorId", u.display_name AS "authorName", c.body, c.created_at AS "createdAt", c.edited_at AS "editedAt"
         FROM proposal_comments c JOIN users u ON u.id = c.author_id WHERE c.proposal_id = $1 ORDER BY c.created_at, c.id`,
      [id],
    );
    return { items: rows.map((r: Record<string, unknown>) => ({ id: r.id, itemId: r.itemId, author: { id: r.authorId, name: r.authorName }, body: r.body, createdAt: r.createdAt, editedAt: r.editedAt })) };
  }

  /** A comment; a reviewer's first word on a waiting proposal puts it in review. */
  async addComment(user: Principal, id: string, body: { body: string; itemId?: string }, req: Request) {
    let startsReview = false;
    let version = 0;
    const { comment, proposal } = await this.ds.transaction(async (m) => {
      const p = await this.findVisible(m, id, user, { lock: true });
      if (body.itemId) {
        const [item] = await m.query(`SELECT 1 FROM proposal_items WHERE id = $1 AND proposal_id = $2`, [body.itemId, id]);
        if (!item) throw new NotFoundError(`No item ${body.itemId} in proposal ${id}`);
      }
      const [row] = await m.query(
        `INSERT INTO proposal_comments (proposal_id, proposal_item_id, author_id, body) VALUES ($1, $2, $3, $4) RETURNING id, created_at AS "createdAt"`,
        [id, body.itemId ?? null, user.userId, body.body.trim()],
      );
      if ((p.state === 'submitted' || p.state === 'resubmitted') && !actorRefusal('start_review', { isAuthor: p.authorId === user.userId, roles: user.roles })) {
        const step = transition(p.state, 'start_review');
        if (step.ok) {
          const [moved] = await queryRows<{ version: number }>(m, `UPDATE proposals SET state = $2 WHERE id = $1 RETURNING version`, [id, step.to]);
          version = moved.version;
          await recordAudit(m, { action: 'proposal.start_review', actor: user, entityType: 'proposal', entityId: id, details: { from: p.state, to: step.to } }, req);
          startsReview = true;
        }
      }
      await recordAudit(m, { action: 'proposal.comment', actor: user, entityType: 'proposal', entityId: id, details: { commentId: row.id, itemId: body.itemId ?? null } }, req);
      return { comment: { id: row.id, itemId: body.itemId ?? null, author: { id: user.userId, name: user.name }, body: body.body.trim(), createdAt: row.createdAt, editedAt: null }, proposal: p };
    });
    const recipients: { email: string }[] = proposal.authorId === user.userId
      ? await this.ds.query(
          `SELECT DISTINCT u.email FROM users u
            WHERE u.id <> $2 AND (u.id IN (SELECT reviewer_id FROM proposal_reviews WHERE proposal_id = $1)
                                  OR u.id IN (SELECT author_id FROM proposal_comments WHERE proposal_id = $1))`,
          [id, user.userId],
        )
      : [{ email: proposal.authorEmail }];
    await this.send(recipients.map((r) => workflowMails.commented(r.email, proposal, user.name, comment.body, this.link(id))));
    // A reviewer's first comment moves the proposal into review (a new version): the client reviews with this one.
    return { ...comment, proposalState: startsReview ? 'in_review' : proposal.state, proposalVersion: startsReview ? version : proposal.version };
  }

}

function snake(cols: ReturnType<typeof itemColumns>) {
  return { species_id: cols.speciesId, species_phase_id: cols.speciesPhaseId, target_value_id: cols.targetValueId, target_fit_id: cols.targetFitId };
}
