import type { ClientBase } from 'pg';

/**
 * The usual bulk-load recipe, applied to whatever the migrations define: set a table's foreign
 * keys, unique constraints and secondary indexes aside, load, then put each back exactly as
 * `pg_get_constraintdef` / `pg_get_indexdef` described it. Re-adding them checks every row at once
 * (a join for a foreign key, a sort for a unique index), which is several times faster than row
 * by row and ends in the same validated schema. Primary keys, CHECK constraints and triggers stay
 * active throughout: the triggers look rows up by primary key.
 *
 * Call inside a transaction, so that a failure puts everything back.
 */
export async function withIndexesRebuilt<T>(client: ClientBase, table: string, load: () => Promise<T>): Promise<{ result: T; rebuildSeconds: number }> {
  const foreignKeys: { name: string; def: string }[] = (await client.query(
    `SELECT conname AS name, pg_get_constraintdef(oid) AS def FROM pg_constraint WHERE conrelid = $1::regclass AND contype = 'f' ORDER BY conname`,
    [table],
  )).rows;
  const uniques: { name: string; def: string }[] = (await client.query(
    `SELECT c.conname AS name, pg_get_constraintdef(c.oid) AS def FROM pg_constraint c
      WHERE c.conrelid = $1::regclass AND c.contype = 'u'
        AND NOT EXISTS (SELECT 1 FROM pg_constraint f WHERE f.contype = 'f' AND f.conindid = c.conindid)
      ORDER BY c.conname`,
    [table],
  )).rows;
  const indexes: { name: string; def: string }[] = (await client.query(
    `SELECT i.indexrelid::regclass::text AS name, pg_get_indexdef(i.indexrelid) AS def FROM pg_index i
      WHERE i.indrelid = $1::regclass AND NOT i.indisprimary
        AND NOT EXISTS (SELECT 1 FROM pg_constraint c WHERE c.conindid = i.indexrelid)
      ORDER BY 1`,
    [table],
  )).rows;

  for (const fk of foreignKeys) await client.query(`ALTER TABLE ${table} DROP CONSTRAINT ${fk.name}`);
  for (const u of uniques) await client.query(`ALTER TABLE ${table} DROP CONSTRAINT ${u.name}`);
  for (const index of indexes) await client.query(`DROP INDEX ${index.name}`);

  const result = await load();

  const started = performance.now();
  for (const index of indexes) await client.query(index.def);
  for (const u of uniques) await client.query(`ALTER TABLE ${table} ADD CONSTRAINT ${u.name} ${u.def}`);
  for (const fk of foreignKeys) await client.query(`ALTER TABLE ${table} ADD CONSTRAINT ${fk.name} ${fk.def}`);
  return { result, rebuildSeconds: (performance.now() - started) / 1000 };
}
