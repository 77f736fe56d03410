import { sharedDataSource } from './test-database';

/** Maps TypeORM's declared column types to what information_schema reports. */
function databaseType(type: unknown): string {
  const name = typeof type === 'function' ? (type as { name: string }).name.toLowerCase() : String(type);
  const aliases: Record<string, string> = {
    uuid: 'uuid', text: 'text', string: 'text', integer: 'integer', int: 'integer', int4: 'integer', number: 'integer', bigint: 'bigint',
    boolean: 'boolean', jsonb: 'jsonb', 'double precision': 'double precision', timestamptz: 'timestamp with time zone',
    'timestamp with time zone': 'timestamp with time zone', inet: 'inet', date: 'timestamp with time zone',
  };
  return aliases[name] ?? name;
}

describe('entities', () => {
  it('map onto columns that exist, with the same type and nullability as the migrations made them', async () => {
    const ds = await sharedDataSource();
    const rows: { table_name: string; column_name: string; data_type: string; udt_name: string; is_nullable: string }[] = await ds.query(
      `SELECT table_name, column_name, data_type, udt_name, is_nullable FROM information_schema.columns WHERE table_schema = 'public'`,
    );
    const columns = new Map(rows.map((r) => [`${r.table_name}.${r.column_name}`, r]));
    const problems: string[] = [];
    let checked = 0;
    for (const entity of ds.entityMetadatas) {
      for (const column of entity.columns) {
        const key = `${entity.tableName}.${column.databaseName}`;
        const actual = columns.get(key);
        if (!actual) {
          problems.push(`${key} does not exist`);
          continue;
        }
        checked++;
        const expected = column.isArray ? 'ARRAY' : databaseType(column.type);
        const found = actual.data_type === 'ARRAY' ? 'ARRAY' : actual.data_type;
        if (expected !== found) problems.push(`${key}: entity says ${expected}, database has ${found}`);
        if (column.isArray && actual.udt_name !== `_${databaseType(column.type) === 'double precision' ? 'float8' : databaseType(column.type)}`) {
          problems.push(`${key}: array of ${String(column.type)}, database has ${actual.udt_name}`);
        }
        const nullable = actual.is_nullable === 'YES';
        if (column.isNullable !== nullable && !column.isPrimary) problems.push(`${key}: entity nullable=${column.isNullable}, database nullable=${nullable}`);
      }
    }
    expect(problems).toEqual([]);
    expect(checked).toBeGreaterThan(100);
  });
});
