import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { Request } from 'express';
import type { Principal } from '../auth/principal';
import { auditInsert } from '../audit/audit.service';
import type { PreparedImport } from './import-rows';
import type { FromWriter, PartText, ToWriter, WriterStart } from './import-write-thread';

/**
 * The one transaction of a real import, written by a thread of its own (import-write-thread.ts):
 * a draft proposal, then its items COPYed part by part while the parts after them are still being
 * checked here (`write` hands a part over and returns at once), then one check of every reference
 * (or a trigger per row where the role may not switch row triggers off), the audit entry and
 * COMMIT. `abort` rolls everything back; so does any failure, and so does PostgreSQL when the
 * process dies (the connection goes with it).
 */
export class ImportWriter {
  private readonly worker: Worker;
  private proposal: string | null = null;
  private sent = 0;
  private written = 0;
  private onProgress: ((rowsWritten: number) => void) | null = null;
  /** the answer `ask` waits for */
  private asked: { expected: FromWriter['type']; resolve: (message: FromWriter) => void; reject: (error: Error) => void } | null = null;
  private ended: Error | null = null;

  /** Starts the writer's thread, which connects and begins the transaction meanwhile; `begin` then makes the proposal. */
  constructor(databaseUrl: string) {
    const start: WriterStart = { databaseUrl };
    this.worker = new Worker(path.join(__dirname, 'import-write-thread.js'), { workerData: { kxImportWriter: start } });
    this.worker.on('message', (message: FromWriter) => {
      if (message.type === 'written') {
        this.written = message.rows;
        this.onProgress?.(message.rows);
        return;
      }
      const asked = this.asked;
      this.asked = null;
      if (message.type === 'failed') asked?.reject(Object.assign(new Error(message.message), message.code ? { code: message.code } : {}));
      else if (message.type === asked?.expected) asked.resolve(message);
    });
    this.worker.on('error', (error) => this.stop(error));
    this.worker.on('exit', () => this.stop(new Error('the import writer stopped before it finished')));
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
    this.worker.postMessage({ type: 'open', proposalId: this.proposal, title, summary, authorId: author.userId } satisfies ToWriter);
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
    this.worker.postMessage({ type: 'part', part: text } satisfies ToWriter);
  }

  /** Waits for every part, checks the references, gives the proposal its final title, records the audit entry and commits; answers the items written. */
  async finish(author: Principal, title: string, details: Record<string, unknown>, req?: Request): Promise<number> {
    const audit = auditInsert({ action: 'proposal.create', actor: author, entityType: 'proposal', entityId: this.proposalId, details: { ...details, items: this.sent } }, req);
    const answer = (await this.ask({ type: 'finish', title, audit }, 'finished')) as Extract<FromWriter, { type: 'finished' }>;
    return answer.items;
  }

  /** Rolls back whatever was written (nothing, when the proposal was not made yet). */
  async abort(): Promise<void> {
    await this.ask({ type: 'abort' }, 'aborted').catch(() => undefined);
  }

  private ask(message: ToWriter, expected: 'finished' | 'aborted'): Promise<FromWriter> {
    if (this.ended) return Promise.reject(this.ended);
    return new Promise((resolve, reject) => {
      this.asked = { expected, resolve, reject };
      this.worker.postMessage(message);
    });
  }

  private stop(error: Error): void {
    if (this.ended) return;
    this.ended = error;
    this.asked?.reject(error);
    this.asked = null;
  }
}
