import type { ClientBase } from 'pg';

/**
 * Bulk writes with the table's integrity checks run once per write instead of once per row.
 *
 * PostgreSQL checks each foreign key of each inserted row with a trigger (a lookup and a row lock
 * per reference); for a large COPY that costs more than the insert itself. Its documentation
 * recommends dropping foreign keys while bulk loading and re-creating them afterwards, which checks
 * every row in one join (PostgreSQL 15 manual, §14.4.4 "Remove Foreign Key Constraints"). Dropping
 * a constraint of a shared table is not possible while others use it, so this does the same inside
 * the writing transaction: the row triggers are switched off for the COPY only
 * (`SET LOCAL session_replication_role = replica`, which leaves CHECK, NOT NULL and immediate
 * UNIQUE constraints in force), and then every foreign key of the rows written is checked in one
 * statement that also takes the FOR KEY SHARE lock the trigger would have taken on each row it
 * refers to. A missing reference throws, and the caller's transaction rolls everything back.
 *
 * The triggers that switch off also include the re-check of DEFERRABLE unique constraints, so
 * those are checked afterwards too. Tables with INSERT triggers of their own are never written this
 * way, nor are foreign keys other than single-column MATCH SIMPLE: `setBasedChecksPossible` says no.
 */

interface ForeignKey {
  name: string;
  column: string;
  hasDefault: boolean;
  referencedTable: string;
  referencedColumn: string;
}

interface DeferrableUnique {
  name: string;
  columns: string[];
}

export interface TableChecks {
  table: string;
  foreignKeys: ForeignKey[];
  deferrableUniques: DeferrableUnique[];
}

/** Thrown when rows written with set-based checks break a constraint; the caller rolls back. */
export class SetBasedCheckError extends Error {}

const identifier = (name: string) => `"${name.replace(/"/g, '""')}"`;

/**
 * The constraints to check for `table`, when this connection may switch row triggers off
 * (superuser, or `GRANT SET ON PARAMETER session_replication_role`) and the table's constraints
 * are all of a kind `checkWrittenRows` checks; else null (write with the row triggers on).
 */
export async function setBasedChecksPossible(client: ClientBase, table: string): Promise<TableChecks | null> {
  const { rows: [role] } = await client.query(
    `SELECT current_setting('is_superuser') = 'on' AS superuser, current_setting('server_version_num')::int AS version`,
  );
  // GRANT SET ON PARAMETER (and has_parameter_privilege) came with PostgreSQL 15.
  const allowed = role.superuser
    || (role.version >= 150000 && (await client.query(`SELECT has_parameter_privilege('session_replication_role', 'SET') AS allowed`)).rows[0].allowed);
  if (!allowed) return null;

  const { rows: [shape] } = await client.query(
    `SELECT
       (SELECT count(*) FROM pg_trigger WHERE tgrelid = $1::regclass AND NOT tgisinternal AND tgenabled <> 'D' AND (tgtype & 4) <> 0)::int AS "insertTriggers",
       (SELECT count(*) FROM pg_constraint WHERE conrelid = $1::regclass AND contype = 'f' AND (cardinality(conkey) <> 1 OR confmatchtype <> 's'))::int AS "otherForeignKeys",
       (SELECT count(*) FROM pg_constraint WHERE conrelid = $1::regclass AND contype = 'x' AND condeferrable)::int AS "deferrableExclusions"`,
    [table],
  );
  if (shape.insertTriggers > 0 || shape.otherForeignKeys > 0 || shape.deferrableExclusions > 0) return null;

  const { rows: foreignKeys } = await client.query(
    `SELECT c.conname AS name, a.attname AS column, a.atthasdef AS "hasDefault", c.confrelid::regclass::text AS "referencedTable", ra.attname AS "referencedColumn"
       FROM pg_constraint c
       JOIN pg_attribute a ON a.attrelid = c.conrelid AND a.attnum = c.conkey[1]
       JOIN pg_attribute ra ON ra.attrelid = c.confrelid AND ra.attnum = c.confkey[1]
      WHERE c.conrelid = $1::regclass AND c.contype = 'f'
      ORDER BY c.conname`,
    [table],
  );
  const { rows: deferrableUniques } = await client.query(
    `SELECT c.conname AS name, array_agg(a.attname::text ORDER BY k.ord) AS columns
       FROM pg_constraint c
       CROSS JOIN LATERAL unnest(c.conkey) WITH ORDINALITY AS k(attnum, ord)
       JOIN pg_attribute a ON a.attrelid = c.conrelid AND a.attnum = k.attnum
      WHERE c.conrelid = $1::regclass AND c.contype IN ('u', 'p') AND c.condeferrable
      GROUP BY c.conname ORDER BY c.conname`,
    [table],
  );
  return { table, foreignKeys, deferrableUniques };
}

/** Row triggers off or on again until the current transaction ends (the setting ends with it). */
export async function rowTriggers(client: ClientBase, state: 'off' | 'on'): Promise<void> {
  await client.query(`SET LOCAL session_replication_role = ${state === 'off' ? 'replica' : 'origin'}`);
}

/** Runs `write` (COPY statements on `client`) with row triggers off in the current transaction, then turns them on again. */
export async function withRowTriggersOff<T>(client: ClientBase, write: () => Promise<T>): Promise<T> {
  await rowTriggers(client, 'off');
  // When the write fails the transaction is aborted and will roll back, setting and all.
  const result = await write();
  await rowTriggers(client, 'on');
  return result;
}

/** Which written rows to check: those whose `column` is `value` (and, optionally, whose `range.column` lies in the range). */
export interface WrittenScope {
  column: string;
  value: unknown;
  range?: { column: string; from: number; to: number };
}

/**
 * Checks the rows written in this transaction that `scope` selects against every foreign key whose
 * column was written (or has a default), locking each referenced row FOR KEY SHARE, and against
 * every DEFERRABLE unique constraint. Throws SetBasedCheckError naming the constraint and up to
 * three offending values.
 */
export async function checkWrittenRows(client: ClientBase, checks: TableChecks, writtenColumns: readonly string[], scope: WrittenScope): Promise<void> {
  await checkForeignKeys(client, checks, writtenColumns, scope);
  await checkDeferrableUniques(client, checks, scope);
}

/** The foreign-key half of `checkWrittenRows`; answers how many rows it checked. */
export async function checkForeignKeys(client: ClientBase, checks: TableChecks, writtenColumns: readonly string[], scope: WrittenScope): Promise<number> {
  const { where, parameters } = scopeSql(scope);
  const foreignKeys = checks.foreignKeys.filter((fk) => writtenColumns.includes(fk.column) || fk.hasDefault);
  const columns = [...new Set(foreignKeys.map((fk) => identifier(fk.column)))];
  // The written rows are read once; each foreign key then makes the lookup and lock of its row
  // trigger (RI_FKey_check) once per distinct value.
  const missing = foreignKeys.map((fk, i) => `SELECT ${i} AS fk, w.k::text AS value
      FROM (SELECT DISTINCT ${identifier(fk.column)} AS k FROM written WHERE ${identifier(fk.column)} IS NOT NULL) w
      LEFT JOIN LATERAL (SELECT 1 AS found FROM ONLY ${fk.referencedTable} r WHERE r.${identifier(fk.referencedColumn)} = w.k FOR KEY SHARE OF r) l ON true
     WHERE l.found IS NULL`);
  const { rows: [result] } = await client.query(
    `WITH written AS MATERIALIZED (SELECT ${columns.length > 0 ? columns.join(', ') : '1'} FROM ${identifier(checks.table)} t WHERE ${where})
     ${missing.length > 0 ? `, missing AS (${missing.join('\n     UNION ALL ')})` : ''}
     SELECT (SELECT count(*) FROM written)::int AS rows,
            ${missing.length > 0 ? `(SELECT json_agg(m) FROM (SELECT fk, value FROM missing LIMIT 3) m)` : 'NULL'} AS missing`,
    parameters,
  );
  const found = (result.missing ?? []) as { fk: number; value: string }[];
  if (found.length > 0) {
    const fk = foreignKeys[found[0].fk];
    const values = found.filter((m) => m.fk === found[0].fk).map((m) => m.value);
    throw new SetBasedCheckError(
      `insert or update on table "${checks.table}" violates foreign key constraint "${fk.name}": no ${fk.referencedTable} (${fk.referencedColumn}) = ${values.join(', ')}`,
    );
  }
  return result.rows as number;
}

/** The unique-constraint half of `checkWrittenRows`. */
export async function checkDeferrableUniques(client: ClientBase, checks: TableChecks, scope: WrittenScope): Promise<void> {
  const table = identifier(checks.table);
  const { where, parameters } = scopeSql(scope);
  for (const unique of checks.deferrableUniques) {
    const columns = unique.columns.map(identifier);
    const key = columns.map((c) => `t.${c}::text`).join(` || ', ' || `);
    // With the scope column in the key, every row that could repeat a written key is in scope: one
    // hashed GROUP BY. Otherwise each written key is looked up in the constraint's index.
    const { rows: repeated } = await client.query(
      unique.columns.includes(scope.column) && !scope.range
        ? `SELECT ${key} AS value FROM ${table} t WHERE ${where} GROUP BY ${columns.map((c) => `t.${c}`).join(', ')} HAVING count(*) > 1 LIMIT 3`
        : `SELECT ${key} AS value FROM ${table} t
            CROSS JOIN LATERAL (SELECT count(*) AS n FROM (SELECT 1 FROM ${table} u WHERE ${columns.map((c) => `u.${c} = t.${c}`).join(' AND ')} LIMIT 2) x) d
            WHERE ${where} AND d.n > 1 LIMIT 3`,
      parameters,
    );
    if (repeated.length > 0) {
      throw new SetBasedCheckError(
        `duplicate key value violates unique constraint "${unique.name}": (${unique.columns.join(', ')}) = ${repeated.map((r) => `(${r.value})`).join(', ')}`,
      );
    }
  }
}

function scopeSql(scope: WrittenScope): { where: string; parameters: unknown[] } {
  const where = `t.${identifier(scope.column)} = $1`;
  if (!scope.range) return { where, parameters: [scope.value] };
  return { where: `${where} AND t.${identifier(scope.range.column)} BETWEEN $2 AND $3`, parameters: [scope.value, scope.range.from, scope.range.to] };
}
