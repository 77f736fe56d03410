import { randomUUID } from 'node:crypto';
import path from 'node:path';
import type { Request } from 'express';
import type { Principal } from '../auth/principal';
import { auditInsert } from '../audit/audit.service';
import { SessionThread } from '../shared/session-thread';
import type { PreparedImport } from './import-rows';
import { WRITER_ROLE, type FromWriter, type PartText, type ToWriter } from './import-write-thread';

type Answer = FromWriter extends infer M ? (M extends { session: string } ? Omit<M, 'session'> : never) : never;
type Instruction = ToWriter extends infer M ? (M extends { session: string } ? Omit<M, 'session'> : never) : never;

/**
 * The one transaction of a real import, written on the writer thread: a draft proposal, then its
 * items COPYed part by part while the parts after them are still being checked here (`write`
 * hands a part over and returns at once), then one check of every reference (or a trigger per row
 * where the role may not switch row triggers off), the audit entry and COMMIT. `abort` rolls
 * everything back; so does any failure, and so does PostgreSQL when the process dies (the
 * connection goes with it).
 */
export class ImportWriter {
  private readonly thread = SessionThread.of<Instruction, FromWriter>(path.join(__dirname, 'import-write-thread.js'), WRITER_ROLE);
  private readonly session = randomUUID();
  private proposal: string | null = null;
  private sent = 0;
  private written = 0;
  private onProgress: ((rowsWritten: number) => void) | null = null;
  /** the answer `ask` waits for */
  private asked: { expected: Answer['type']; resolve: (answer: Answer) => void; reject: (error: Error) => void } | null = null;
  private ended: Error | null = null;

  /** Opens the import's session, whose connection and transaction begin meanwhile; `begin` then makes the proposal. */
  constructor(databaseUrl: string) {
    this.thread.open(this.session, (answer) => this.hear(answer), (error) => this.stop(error));
    this.thread.send(this.session, { type: 'connect', databaseUrl });
  }

  get proposalId(): string {
    if (!this.proposal) throw new Error('the import writer has not made its proposal yet');
    return this.proposal;
  }

  /**
   * Makes the draft proposal the items go to, once the writer is connected; returns its id at
   * once (the parts sent meanwhile wait for it). A failure surfaces in `finish`.
   */
  begin(author: Principal, title: string, summary: string): string {
    this.proposal = randomUUID();
    this.thread.send(this.session, { type: 'open', proposalId: this.proposal, title, summary, authorId: author.userId });
    return this.proposal;
  }

  /** Hears the number of items written after each part from now on. */
  reportTo(onProgress: (rowsWritten: number) => void): void {
    this.onProgress = onProgress;
    if (this.written > 0) onProgress(this.written);
  }

  /** Hands a checked part (items in position order) to the writer's thread; returns at once. */
  write(part: PreparedImport): void {
    if (part.items.length === 0 || this.ended) return;
    const text: PartText = { ids: [], positions: [], kinds: [], payloads: [], sourceIds: [], speciesIds: [], speciesPhaseIds: [] };
    for (const [i, item] of part.items.entries()) {
      text.ids.push(item.id);
      text.positions.push(item.position);
      text.kinds.push(item.kind);
      // JSON text crosses to the other thread faster than the objects would.
      text.payloads.push(JSON.stringify(item.payload));
      text.sourceIds.push(item.sourceId);
      text.speciesIds.push(part.columns[i].speciesId);
      text.speciesPhaseIds.push(part.columns[i].speciesPhaseId);
    }
    this.sent += part.items.length;
    this.thread.send(this.session, { type: 'part', part: text });
  }

  /** Waits for every part, checks the references, gives the proposal its final title, records the audit entry and commits; answers the items written. */
  async finish(author: Principal, title: string, details: Record<string, unknown>, req?: Request): Promise<number> {
    const audit = auditInsert({ action: 'proposal.create', actor: author, entityType: 'proposal', entityId: this.proposalId, details: { ...details, items: this.sent } }, req);
    const answer = (await this.ask({ type: 'finish', title, audit }, 'finished')) as Extract<Answer, { type: 'finished' }>;
    return answer.items;
  }

  /** Rolls back whatever was written (nothing, when the proposal was not made yet). */
  async abort(): Promise<void> {
    await this.ask({ type: 'abort' }, 'aborted').catch(() => undefined);
  }

  private hear(answer: Answer): void {
    if (answer.type === 'written') {
      this.written = answer.rows;
      this.onProgress?.(answer.rows);
      return;
    }
    const asked = this.asked;
    this.asked = null;
    // finished, aborted or failed: the session is over.
    this.thread.close(this.session);
    this.ended ??= new Error('the import writer has finished');
    if (answer.type === 'failed') asked?.reject(Object.assign(new Error(answer.message), answer.code ? { code: answer.code } : {}));
    else if (answer.type === asked?.expected) asked.resolve(answer);
  }

  private ask(instruction: Instruction, expected: 'finished' | 'aborted'): Promise<Answer> {
    if (this.ended) return Promise.reject(this.ended);
    return new Promise((resolve, reject) => {
      this.asked = { expected, resolve, reject };
      this.thread.send(this.session, instruction);
    });
  }

  private stop(error: Error): void {
    if (this.ended) return;
    this.ended = error;
    this.asked?.reject(error);
    this.asked = null;
  }
}
