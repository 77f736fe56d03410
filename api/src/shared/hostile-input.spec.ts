import request from 'supertest';
import fc from 'fast-check';
import { testApp, type TestApp } from '../testing/test-app';

// Injection and script payloads of the kinds the OWASP testing guide lists (common practice).
const HOSTILE = [
  "'; DROP TABLE species; --",
  "' OR '1'='1",
  '1); DELETE FROM thermo_values; --',
  "H2O' UNION SELECT password_hash FROM users --",
  '<script>alert(1)</script>',
  '"><img src=x onerror=alert(1)>',
  '${7*7}{{7*7}}',
  '../../etc/passwd',
  '\u0000\u0001\u0002',
  'C'.repeat(5000),
  '((((((((((((((((((((H2O',
  'NH4+ + SO4^2- -> ->',
  '1e308 H2 -> H2',
  'Ω≈ç√∫˜µ≤≥÷',
];

const TABLES = ['species', 'species_phases', 'thermo_values', 'heat_capacity_fits', 'sources', 'releases', 'release_members', 'users', 'proposals'];

describe('hostile and generated input never reaches a 5xx or changes data', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await testApp();
  });

  const snapshot = async () =>
    Promise.all(TABLES.map(async (table) => (await t.dataSource.query(`SELECT count(*)::int AS n, md5(string_agg(id::text, ',' ORDER BY id)) AS h FROM ${table}`))[0]));

  it('answers 10 000 generated formulas, equations and query strings without a server error', async () => {
    const before = await snapshot();
    const text = fc.oneof(
      fc.constantFrom(...HOSTILE),
      fc.string({ maxLength: 40 }),
      fc.stringMatching(/^[A-Z][a-z]?\d{0,2}([A-Z][a-z]?\d{0,2}){0,4}(\((g|l|cr|aq)\))?$/),
      fc.tuple(fc.constantFrom(...HOSTILE), fc.string({ maxLength: 10 })).map(([a, b]) => a + b),
    );
    const equation = fc.oneof(
      text,
      fc.tuple(fc.integer({ min: -3, max: 5 }), text, fc.constantFrom('->', '=', '<=>', '→', '+', ''), text).map(([n, a, arrow, b]) => `${n} ${a} ${arrow} ${b}`),
    );
    const requestFor = fc.oneof(
      text.map((q) => ({ method: 'get' as const, url: `/api/v1/species?q=${encodeURIComponent(q)}` })),
      text.map((f) => ({ method: 'get' as const, url: `/api/v1/species?formula=${encodeURIComponent(f)}` })),
      fc.tuple(text, text).map(([e, m]) => ({ method: 'get' as const, url: `/api/v1/species?elements=${encodeURIComponent(e)}&elementsMode=${encodeURIComponent(m)}` })),
      fc.tuple(text, text).map(([sort, release]) => ({ method: 'get' as const, url: `/api/v1/species?sort=${encodeURIComponent(sort)}&release=${encodeURIComponent(release)}` })),
      fc.tuple(text, text).map(([id, temps]) => ({ method: 'get' as const, url: `/api/v1/species/${encodeURIComponent(id)}/properties?T=${encodeURIComponent(temps)}` })),
      equation.map((e) => ({ method: 'post' as const, url: '/api/v1/reactions/balance', body: { equation: e } })),
      fc.tuple(equation, fc.array(fc.oneof(fc.double(), fc.string({ maxLength: 5 })), { maxLength: 4 })).map(([e, temperatures]) => ({
        method: 'post' as const,
        url: '/api/v1/reactions/evaluate',
        body: { equation: e, temperatures },
      })),
    );
    const failures: string[] = [];
    const samples = fc.sample(requestFor, { numRuns: 10_000, seed: 20261201 });
    for (const r of samples) {
      const res = r.method === 'get' ? await request(t.app).get(r.url) : await request(t.app).post(r.url).send(r.body);
      if (res.status >= 500) failures.push(`${r.method.toUpperCase()} ${r.url} ${JSON.stringify('body' in r ? r.body : '')} → ${res.status}`);
      if (res.status >= 400 && typeof res.body?.message !== 'string') failures.push(`${r.url} → ${res.status} without a message`);
      if (failures.length > 5) break;
    }
    expect(samples.length).toBe(10_000);
    expect(failures).toEqual([]);
    expect(await snapshot()).toEqual(before);
  }, 600_000);
});
