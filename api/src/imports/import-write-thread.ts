import { parentPort } from 'node:worker_threads';
import { Client } from 'pg';
import { CopyTextBuilder, copyPieces } from '../shared/copy-rows';
import { isSessionThread } from '../shared/session-thread';
import { checkDeferrableUniques, checkForeignKeys, rowTriggers, SetBasedCheckError, setBasedChecksPossible, type TableChecks } from '../shared/set-based-checks';

/**
 * The bulk imports' writer, on a thread of its own shared by the imports (SessionThread). Each
 * import is a session here: one connection, one transaction. The request's thread checks the rows
 * and sends each checked part (its payloads as JSON text); this thread builds the part's COPY text
 * and keeps the connection busy, so the database writes while the API checks (on one thread the
 * COPY would only move when the checking paused). Messages: see `ToWriter` and `FromWriter`.
 */

export const ITEM_COLUMNS = ['id', 'proposal_id', 'position', 'kind', 'payload', 'source_id', 'species_id', 'species_phase_id'] as const;

/** A checked part's items, column by column, in position order; payloads as JSON text. */
export interface PartText {
  ids: string[];
  positions: number[];
  kinds: string[];
  payloads: string[];
  sourceIds: (string | null)[];
  speciesIds: (string | null)[];
  speciesPhaseIds: (string | null)[];
}

/** Every message names the import (session) it belongs to. */
export type ToWriter = { session: string } & (
  | { type: 'connect'; databaseUrl: string }
  | { type: 'open'; proposalId: string; title: string; summary: string; authorId: string }
  | { type: 'part'; part: PartText }
  | { type: 'finish'; title: string; audit: { text: string; values: unknown[] } }
  | { type: 'abort' }
);

export type FromWriter = { session: string } & (
  | { type: 'written'; rows: number }
  | { type: 'finished'; items: number }
  | { type: 'aborted' }
  | { type: 'failed'; message: string; code?: string }
);

type Reply = FromWriter extends infer M ? (M extends { session: string } ? Omit<M, 'session'> : never) : never;

export const WRITER_ROLE = 'import-writer';

if (isSessionThread(WRITER_ROLE)) serve();

function serve(): void {
  const port = parentPort!;
  const sessions = new Map<string, WriterSession>();
  port.on('message', (message: ToWriter) => {
    if (message.type === 'connect') {
      const reply = (answer: Reply) => port.postMessage({ ...answer, session: message.session });
      sessions.set(message.session, new WriterSession(message.databaseUrl, reply, () => sessions.delete(message.session)));
      return;
    }
    const session = sessions.get(message.session);
    if (!session) return;
    if (message.type === 'open') session.open(message);
    else if (message.type === 'part') session.write(message.part);
    else if (message.type === 'finish') void session.finish(message.title, message.audit);
    else void session.abort();
  });
}

/** One import: its connection and transaction, the parts queued on it, and how far they got. */
class WriterSession {
  private readonly client: Client;
  /** connected, in the transaction, and the way of checking references known */
  private readonly ready: Promise<void>;
  private checks: TableChecks | null = null;
  private connected = false;
  private proposalId = '';
  /** the parts' COPY statements and checks, one after another */
  private queue: Promise<void> = Promise.resolve();
  private failure: Error | null = null;
  private written = 0;
  private checked = 0;

  constructor(databaseUrl: string, private readonly reply: (answer: Reply) => void, private readonly ended: () => void) {
    this.client = new Client({ connectionString: databaseUrl, connectionTimeoutMillis: 5000 });
    // A connection lost between statements: the next statement fails with it; keep the first cause.
    this.client.on('error', (error) => {
      this.failure ??= error;
    });
    // Connected and in a transaction while the request's thread still reads the file.
    this.ready = (async () => {
      await this.client.connect();
      this.connected = true;
      await this.client.query('BEGIN');
      this.checks = await setBasedChecksPossible(this.client, 'proposal_items');
      if (this.checks) await rowTriggers(this.client, 'off');
    })();
    this.ready.catch(() => undefined);
  }

  /** The proposal, made once connected; the parts sent meanwhile wait for it. */
  open(message: { proposalId: string; title: string; summary: string; authorId: string }): void {
    this.proposalId = message.proposalId;
    this.enqueue(async () => {
      await this.ready;
      await this.client.query(`INSERT INTO proposals (id, title, summary, author_id) VALUES ($1, $2, $3, $4)`, [this.proposalId, message.title.slice(0, 300), message.summary, message.authorId]);
    });
  }

  write(part: PartText): void {
    if (this.failure) return;
    // The COPY text is built as soon as the part arrives, while the database takes the part before it.
    const text = new CopyTextBuilder();
    // Ids, positions and kinds are the API's own (uuids, integers, vocabulary words): nothing to escape.
    for (let i = 0; i < part.ids.length; i++) {
      text.word(part.ids[i]).word(this.proposalId).word(part.positions[i]).word(part.kinds[i]).jsonText(part.payloads[i])
        .word(part.sourceIds[i]).word(part.speciesIds[i]).word(part.speciesPhaseIds[i]).endRow();
    }
    const rows = text.rows;
    const pieces = text.finish();
    const range = { column: 'position', from: part.positions[0], to: part.positions[part.positions.length - 1] };
    // Each part after the one before it: its COPY, then the check of its references.
    this.enqueue(async () => {
      if (this.failure) return;
      await copyPieces(this.client, 'proposal_items', ITEM_COLUMNS, pieces);
      if (this.checks) this.checked += await checkForeignKeys(this.client, this.checks, ITEM_COLUMNS, { column: 'proposal_id', value: this.proposalId, range });
      this.written += rows;
      this.reply({ type: 'written', rows: this.written });
    });
  }

  async finish(title: string, audit: { text: string; values: unknown[] }): Promise<void> {
    const { client, proposalId } = this;
    try {
      await this.queue;
      if (this.failure) throw this.failure;
      if (this.checks) {
        await rowTriggers(client, 'on');
        const scope = { column: 'proposal_id', value: proposalId };
        await checkDeferrableUniques(client, this.checks, scope);
        // Every row lies in exactly one checked part: no position twice (just checked), and as many rows as were checked.
        const [{ rows }] = (await client.query(`SELECT count(*)::int AS rows FROM proposal_items WHERE proposal_id = $1`, [proposalId])).rows;
        if (rows !== this.checked) throw new SetBasedCheckError(`${rows} items written but the references of ${this.checked} checked`);
      }
      // The title may name what only the end of the file told (how many values).
      await client.query(`UPDATE proposals SET title = $2 WHERE id = $1 AND title <> $2`, [proposalId, title.slice(0, 300)]);
      await client.query(audit.text, audit.values);
      await this.end('COMMIT');
      this.reply({ type: 'finished', items: this.written });
    } catch (error) {
      await this.end('ROLLBACK').catch(() => undefined);
      this.reply(failed(error));
    }
  }

  /** Rolls back whatever was written (nothing, when the proposal was not made yet). */
  async abort(): Promise<void> {
    await this.ready.then(() => this.queue).then(() => this.end('ROLLBACK')).catch(() => this.close());
    this.reply({ type: 'aborted' });
  }

  private enqueue(step: () => Promise<void>): void {
    this.queue = this.queue.then(step).catch((error: Error) => {
      this.failure ??= error;
    });
  }

  private async end(statement: 'COMMIT' | 'ROLLBACK'): Promise<void> {
    // pg queues a statement on a connection that failed as it opened, and never runs it: nothing to end there.
    if (!this.connected) {
      this.close();
      if (statement === 'COMMIT') throw new Error('the import writer is not connected');
      return;
    }
    await this.client.query(statement).finally(() => this.close());
  }

  private close(): void {
    this.ended();
    // Not awaited: pg's end() of a connection that failed as it opened can wait for an 'end' event that has already gone by.
    this.client.end().catch(() => undefined);
  }
}

/** A failure as a message, with the PostgreSQL or socket error code that tells an outage from a refusal. */
function failed(error: unknown): Reply {
  const e = error as { message?: string; code?: string };
  return { type: 'failed', message: e.message ?? String(error), ...(typeof e.code === 'string' ? { code: e.code } : {}) };
}
