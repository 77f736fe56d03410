import { createHash, randomUUID } from 'node:crypto';
import type { Request } from 'express';
import type { Readable } from 'node:stream';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { canSeeProposal } from '../proposals/proposal-access';
import { itemsEditable } from '../proposals/proposal-state-machine';
import type { ProposalState } from '../proposals/proposal-vocabulary';
import { ConflictError, ForbiddenError, NotFoundError, ServiceUnavailableError, UnprocessableError, UnsupportedMediaTypeError } from '../shared/errors';
import { safeFileName } from '../shared/uploads';
import { judgeMediaType } from './media-type';

export interface EvidenceView {
  id: string;
  proposalId: string | null;
  itemId: string | null;
  sourceId: string | null;
  fileName: string;
  mediaType: string;
  sizeBytes: number;
  sha256: string;
  description: string | null;
  createdAt: Date;
}

const EVIDENCE_COLUMNS = `e.id, i.proposal_id AS "proposalId", e.proposal_item_id AS "itemId", e.source_id AS "sourceId", e.file_name AS "fileName",
  e.media_type AS "mediaType", e.size_bytes::float8 AS "sizeBytes", e.sha256, e.description, e.created_at AS "createdAt"`;

/** Roles that may read evidence attached to a source only (no proposal to ask). */
const SOURCE_EVIDENCE_READERS = ['steward', 'reviewer', 'editor', 'admin'];

/**
 * Evidence files behind proposal items: checked by content, fingerprinted with SHA-256, kept in
 * the object store; readable by whoever may see the proposal.
 */
export class EvidenceService {
  constructor(private readonly ctx: AppContext) {}

  private store() {
    if (!this.ctx.store) throw new ServiceUnavailableError('The file store is not configured');
    return this.ctx.store;
  }

  /** Cheap check before a body is read into memory: the caller may attach files to this item now. */
  async assertMayAttach(user: Principal, proposalId: string, itemId: string, manager: EntityManager = this.ctx.dataSource.manager): Promise<void> {
    const [row] = await manager.query(
      `SELECT p.author_id AS "authorId", p.state, i.id AS "itemId" FROM proposals p LEFT JOIN proposal_items i ON i.proposal_id = p.id AND i.id = $2 WHERE p.id = $1`,
      [proposalId, itemId],
    );
    if (!row || !canSeeProposal(row, user)) throw new NotFoundError(`No proposal ${proposalId}`);
    if (row.authorId !== user.userId) throw new ForbiddenError('Only the author of a proposal attaches evidence to its items');
    if (!itemsEditable(row.state)) throw new ConflictError(`Evidence is attached while the proposal is a draft or changes are requested; it is ${String(row.state).replace('_', ' ')}`, { state: row.state });
    if (!row.itemId) throw new NotFoundError(`No item ${itemId} in proposal ${proposalId}`);
  }

  async upload(user: Principal, proposalId: string, itemId: string, file: Express.Multer.File, description: string | undefined, req: Request): Promise<EvidenceView> {
    if (file.size === 0 || file.buffer.length === 0) throw new UnprocessableError('The file is empty');
    const verdict = judgeMediaType(file.mimetype, file.buffer);
    if (!verdict.ok) throw new UnsupportedMediaTypeError(verdict.reason);
    const sha256 = createHash('sha256').update(file.buffer).digest('hex');
    const fileName = safeFileName(file.originalname, 'evidence');
    const id = randomUUID();
    const objectKey = `evidence/${id}/${fileName}`;
    const store = this.store();
    await this.ctx.dataSource.transaction(async (m) => {
      await m.query(`SELECT 1 FROM proposals WHERE id = $1 FOR UPDATE`, [proposalId]);
      await this.assertMayAttach(user, proposalId, itemId, m);
      await m.query(
        `INSERT INTO evidence_files (id, proposal_item_id, file_name, media_type, size_bytes, sha256, object_key, description, uploaded_by)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)`,
        [id, itemId, fileName, verdict.mediaType, file.buffer.length, sha256, objectKey, description?.trim() || null, user.userId],
      );
      await recordAudit(m, {
        action: 'evidence.upload', actor: user, entityType: 'evidence_file', entityId: id,
        details: { proposalId, itemId, fileName, mediaType: verdict.mediaType, declared: file.mimetype, sizeBytes: file.buffer.length, sha256 },
      }, req);
      // Stored before the commit: if the store refuses, the row is rolled back with it.
      await store.put(objectKey, file.buffer, verdict.mediaType);
    });
    return this.view(id);
  }

  async view(id: string): Promise<EvidenceView> {
    const [row] = await this.ctx.dataSource.query(`SELECT ${EVIDENCE_COLUMNS} FROM evidence_files e LEFT JOIN proposal_items i ON i.id = e.proposal_item_id WHERE e.id = $1`, [id]);
    if (!row) throw new NotFoundError(`No evidence file ${id}`);
    return row;
  }

  /** The file and its bytes, for someone allowed to see the proposal (or, for source evidence, the editorial roles). */
  async download(user: Principal, id: string): Promise<{ file: EvidenceView; body: Readable }> {
    const [row] = await this.ctx.dataSource.query(
      `SELECT ${EVIDENCE_COLUMNS}, e.object_key AS "objectKey", p.author_id AS "authorId", p.state
         FROM evidence_files e
         LEFT JOIN proposal_items i ON i.id = e.proposal_item_id
         LEFT JOIN proposals p ON p.id = i.proposal_id
        WHERE e.id = $1`,
      [id],
    );
    if (!row) throw new NotFoundError(`No evidence file ${id}`);
    const allowed = row.authorId
      ? canSeeProposal({ authorId: row.authorId, state: row.state as ProposalState }, user)
      : user.roles.some((r) => SOURCE_EVIDENCE_READERS.includes(r));
    if (!allowed) throw new ForbiddenError('Evidence files are for the proposal\'s author, reviewers, editors and admins');
    const { objectKey, authorId: _a, state: _s, ...file } = row;
    const body = await this.store().get(objectKey);
    return { file, body };
  }
}
