import { createHash } from 'node:crypto';
import type { EntityManager } from 'typeorm';

/**
 * A fixed, name-based UUID (RFC 4122 version-5 layout over SHA-1) for a seeded record, so that
 * loading the seed again finds the same rows and inserts nothing.
 */
export function seedId(kind: string, key: string): string {
  const hash = createHash('sha1').update(`kelvindex-seed/${kind}/${key}`).digest();
  hash[6] = (hash[6] & 0x0f) | 0x50;
  hash[8] = (hash[8] & 0x3f) | 0x80;
  const hex = hash.subarray(0, 16).toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/**
 * A decimal as printed, times 10^power, without binary rounding on the way: "-285.830" with
 * power 3 gives exactly the double nearest to −285830 (kJ/mol → J/mol).
 */
export function scaledDecimal(text: string, power: number): number {
  const match = /^([+\-−]?)(\d*)(?:\.(\d*))?$/.exec(text.trim());
  if (!match || (match[2] === '' && (match[3] ?? '') === '')) throw new Error(`"${text}" is not a decimal number`);
  const sign = match[1] === '' || match[1] === '+' ? '' : '-';
  const whole = match[2];
  const fraction = match[3] ?? '';
  const digits = whole + fraction;
  const point = whole.length + power;
  let shifted: string;
  if (point >= digits.length) shifted = digits + '0'.repeat(point - digits.length);
  else if (point <= 0) shifted = `0.${'0'.repeat(-point)}${digits}`;
  else shifted = `${digits.slice(0, point)}.${digits.slice(point)}`;
  return Number(sign + shifted);
}

/**
 * INSERT … ON CONFLICT DO NOTHING for rows keyed by column name (snake_case, as in the table).
 * jsonb values must be passed as JSON text. Returns how many rows were new.
 */
export async function insertMissing(
  manager: EntityManager,
  table: string,
  rows: Record<string, unknown>[],
  conflictTarget = '(id)',
): Promise<number> {
  if (rows.length === 0) return 0;
  const columns = Object.keys(rows[0]);
  let inserted = 0;
  // Stay well below PostgreSQL's 65 535 bind parameters per statement.
  const batchSize = Math.max(1, Math.floor(30000 / columns.length));
  for (let start = 0; start < rows.length; start += batchSize) {
    const batch = rows.slice(start, start + batchSize);
    const params: unknown[] = [];
    const tuples = batch.map((row) => {
      const keys = Object.keys(row);
      if (keys.length !== columns.length || keys.some((k, i) => k !== columns[i])) {
        throw new Error(`Seed rows for ${table} must all have the columns ${columns.join(', ')}`);
      }
      return `(${columns.map((c) => {
        params.push(row[c]);
        return `$${params.length}`;
      }).join(', ')})`;
    });
    const result: unknown[] = await manager.query(
      `INSERT INTO ${table} (${columns.join(', ')}) VALUES ${tuples.join(', ')} ON CONFLICT ${conflictTarget} DO NOTHING RETURNING 1`,
      params,
    );
    inserted += result.length;
  }
  return inserted;
}
