import { CONSTRAINT_MESSAGES } from './constraint-messages';
import { sharedDataSource } from './test-database';

describe('constraint messages', () => {
  it('cover every named CHECK and UNIQUE constraint and every rule a trigger raises, and nothing else', async () => {
    const ds = await sharedDataSource();
    const constraints: { name: string }[] = await ds.query(
      `SELECT c.conname AS name FROM pg_constraint c JOIN pg_namespace n ON n.oid = c.connamespace
        WHERE n.nspname = 'public' AND c.contype IN ('c', 'u')`,
    );
    const uniqueIndexes: { name: string }[] = await ds.query(
      `SELECT i.relname AS name FROM pg_index x JOIN pg_class i ON i.oid = x.indexrelid JOIN pg_namespace n ON n.oid = i.relnamespace
        WHERE n.nspname = 'public' AND x.indisunique AND NOT x.indisprimary
          AND NOT EXISTS (SELECT 1 FROM pg_constraint c WHERE c.conindid = x.indexrelid)`,
    );
    const sources: { src: string }[] = await ds.query(
      `SELECT p.prosrc AS src FROM pg_proc p JOIN pg_namespace n ON n.oid = p.pronamespace WHERE n.nspname = 'public' AND p.proname LIKE 'kx\\_%'`,
    );
    const raised = sources.flatMap((s) => [...s.src.matchAll(/CONSTRAINT = '([a-z0-9_]+)'/g)].map((match) => match[1]));
    // schema_migrations belongs to TypeORM; pg-boss keeps its own schema.
    const inDatabase = new Set([...constraints, ...uniqueIndexes].map((c) => c.name).filter((n) => !n.startsWith('schema_migrations')).concat(raised));

    const missing = [...inDatabase].filter((name) => !(name in CONSTRAINT_MESSAGES)).sort();
    const stale = Object.keys(CONSTRAINT_MESSAGES).filter((name) => !inDatabase.has(name)).sort();
    expect(missing).withContext('constraints without a message').toEqual([]);
    expect(stale).withContext('messages for constraints that do not exist').toEqual([]);
  });
});
