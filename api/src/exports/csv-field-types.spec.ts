import { testApp, type TestApp } from '../testing/test-app';
import { floatText } from './csv-field-types';

describe('CSV field types of an export', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await testApp();
  });

  /** Doubles across the whole range as this PostgreSQL prints them (float8 to text). */
  const printedDoubles = `
    SELECT x::text AS text FROM (
      SELECT sign * mantissa * 10::float8 ^ exponent AS x
        FROM unnest(ARRAY[1, 1.5, 2.5, 1 / 3::float8, 2 / 3::float8, pi(), 0.1 + 0.2::float8, 123456789.123456789, 9.999999999999999, 4.35]) AS mantissa,
             generate_series(-30, 30) AS exponent, unnest(ARRAY[1, -1]) AS sign
      UNION ALL
      SELECT unnest(ARRAY['0', '-0', 'Infinity', '-Infinity', 'NaN', '5e-324', '2.2250738585072014e-308', '1.7976931348623157e308',
                          '1e-4', '9.9999e-5', '1e15', '999999999999999.9', '1e21', '-241826', '-74873.123', '298.15', '100000']::float8[])) doubles`;

  it('spells each double as JavaScript prints the number pg would have parsed', async () => {
    const rows: { text: string }[] = await t.dataSource.query(printedDoubles);
    expect(rows.length).toBeGreaterThan(1000);
    for (const { text } of rows) expect(floatText(text)).withContext(text).toBe(String(parseFloat(text)));
  });

  it('does so too when PostgreSQL prints fewer digits (extra_float_digits ≤ 0)', async () => {
    const rows: { text: string }[] = await t.dataSource.transaction(async (m) => {
      await m.query('SET LOCAL extra_float_digits = -3');
      return m.query(printedDoubles);
    });
    for (const { text } of rows) expect(floatText(text)).withContext(text).toBe(String(parseFloat(text)));
  });
});
