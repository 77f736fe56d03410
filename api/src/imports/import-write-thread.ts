import { parentPort, workerData } from 'node:worker_threads';
import { Client } from 'pg';
import { CopyTextBuilder, copyPieces } from '../shared/copy-rows';
import { checkDeferrableUniques, checkForeignKeys, rowTriggers, SetBasedCheckError, setBasedChecksPossible, type TableChecks } from '../shared/set-based-checks';

/**
 * The bulk import's writer, on a thread of its own: one connection, one transaction. The request's
 * thread checks the rows and sends each checked part here (its payloads as JSON text); this thread
 * builds the part's COPY text and keeps the connection busy, so the database writes while the API
 * checks (on one thread the COPY would only move when the checking paused). Messages: see
 * `ToWriter` and `FromWriter`.
 */

export const ITEM_COLUMNS = ['id', 'proposal_id', 'position', 'kind', 'payload', 'source_id', 'species_id', 'species_phase_id'] as const;

export interface WriterStart {
  databaseUrl: string;
}

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

export type ToWriter =
  | { type: 'open'; proposalId: string; title: string; summary: string; authorId: string }
  | { type: 'part'; part: PartText }
  | { type: 'finish'; title: string; audit: { text: string; values: unknown[] } }
  | { type: 'abort' };

export type FromWriter =
  | { type: 'written'; rows: number }
  | { type: 'finished'; items: number }
  | { type: 'aborted' }
  | { type: 'failed'; message: string; code?: string };

if (parentPort && workerData?.kxImportWriter) void run(workerData.kxImportWriter as WriterStart);

async function run(start: WriterStart): Promise<void> {
  const port = parentPort!;
  const send = (message: FromWriter) => port.postMessage(message);
  let checks: TableChecks | null = null;
  let proposalId = '';
  /** the parts' COPY statements and checks, one after another */
  let queue: Promise<void> = Promise.resolve();
  let failure: Error | null = null;
  let written = 0;
  let checked = 0;
  const client = new Client({ connectionString: start.databaseUrl, connectionTimeoutMillis: 5000 });
  // A connection lost between statements: the next statement fails with it; keep the first cause.
  client.on('error', (error) => {
    failure ??= error;
  });

  const end = async (outcome: 'commit' | 'rollback') => {
    await client.query(outcome === 'commit' ? 'COMMIT' : 'ROLLBACK').finally(() => client.end().catch(() => undefined));
  };

  // Connected and in a transaction while the request's thread still reads the file.
  const ready = (async () => {
    await client.connect();
    await client.query('BEGIN');
    checks = await setBasedChecksPossible(client, 'proposal_items');
    if (checks) await rowTriggers(client, 'off');
  })();
  ready.catch(() => undefined);

  port.on('message', (message: ToWriter) => {
    if (message.type === 'open') {
      open(message);
    } else if (message.type === 'part') {
      if (failure) return;
      const part = message.part;
      // The COPY text is built as soon as the part arrives, while the database takes the part before it.
      const text = new CopyTextBuilder();
      // Ids, positions and kinds are the API's own (uuids, integers, vocabulary words): nothing to escape.
      for (let i = 0; i < part.ids.length; i++) {
        text.word(part.ids[i]).word(proposalId).word(part.positions[i]).word(part.kinds[i]).jsonText(part.payloads[i])
          .word(part.sourceIds[i]).word(part.speciesIds[i]).word(part.speciesPhaseIds[i]).endRow();
      }
      const rows = text.rows;
      const pieces = text.finish();
      const range = { column: 'position', from: part.positions[0], to: part.positions[part.positions.length - 1] };
      // Each part after the one before it: its COPY, then the check of its references.
      queue = queue.then(async () => {
        if (failure) return;
        await copyPieces(client, 'proposal_items', ITEM_COLUMNS, pieces);
        if (checks) checked += await checkForeignKeys(client, checks, ITEM_COLUMNS, { column: 'proposal_id', value: proposalId, range });
        written += rows;
        send({ type: 'written', rows: written });
      }).catch((error: Error) => {
        failure ??= error;
      });
    } else if (message.type === 'finish') {
      void finish(message.title, message.audit);
    } else {
      void ready.then(() => queue).then(() => end('rollback')).catch(() => client.end().catch(() => undefined)).then(() => {
        send({ type: 'aborted' });
        port.close();
      });
    }
  });

  /** The proposal, made once connected; the parts sent meanwhile wait for it. */
  function open(message: Extract<ToWriter, { type: 'open' }>): void {
    proposalId = message.proposalId;
    queue = queue.then(async () => {
      await ready;
      await client.query(`INSERT INTO proposals (id, title, summary, author_id) VALUES ($1, $2, $3, $4)`, [proposalId, message.title.slice(0, 300), message.summary, message.authorId]);
    }).catch((error: Error) => {
      failure ??= error;
    });
  }

  async function finish(title: string, audit: { text: string; values: unknown[] }): Promise<void> {
    try {
      await queue;
      if (failure) throw failure;
      if (checks) {
        await rowTriggers(client, 'on');
        const scope = { column: 'proposal_id', value: proposalId };
        await checkDeferrableUniques(client, checks, scope);
        // Every row lies in exactly one checked part: no position twice (just checked), and as many rows as were checked.
        const [{ rows }] = (await client.query(`SELECT count(*)::int AS rows FROM proposal_items WHERE proposal_id = $1`, [proposalId])).rows;
        if (rows !== checked) throw new SetBasedCheckError(`${rows} items written but the references of ${checked} checked`);
      }
      // The title may name what only the end of the file told (how many values).
      await client.query(`UPDATE proposals SET title = $2 WHERE id = $1 AND title <> $2`, [proposalId, title.slice(0, 300)]);
      await client.query(audit.text, audit.values);
      await end('commit');
      send({ type: 'finished', items: written });
    } catch (error) {
      await end('rollback').catch(() => undefined);
      send(failed(error));
    } finally {
      port.close();
    }
  }
}

/** A failure as a message, with the PostgreSQL or socket error code that tells an outage from a refusal. */
function failed(error: unknown): FromWriter {
  const e = error as { message?: string; code?: string };
  return { type: 'failed', message: e.message ?? String(error), ...(typeof e.code === 'string' ? { code: e.code } : {}) };
}
