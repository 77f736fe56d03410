import request from 'supertest';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';
import { TM4513 } from '../thermo/testing/published-values';
import { EXPORT_COLUMNS } from './export.service';

/** RFC 4180 fields of one CSV text (quotes doubled inside quoted fields). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) rows.push([...row, field]);
  return rows;
}

const text = (res: request.Response) => (typeof res.body === 'string' || Buffer.isBuffer(res.body) ? res.body.toString() : res.text);

describe('export API', () => {
  let t: TestApp;
  const exported = (query: string) => request(t.app).get(`/api/v1/export?${query}`).buffer(true).parse((res, done) => {
    let data = '';
    res.setEncoding('utf8');
    res.on('data', (chunk: string) => (data += chunk));
    res.on('end', () => done(null, data));
  });
  let members: { release: string; n: number; recommended: number }[];

  beforeAll(async () => {
    t = await testApp();
    members = (await t.dataSource.query(
      `SELECT r.label AS release, count(*)::int AS n, count(*) FILTER (WHERE m.is_recommended)::int AS recommended
         FROM release_members m JOIN releases r ON r.id = m.release_id WHERE r.label IN ('2026.1', '2026.2') GROUP BY r.label`,
    ));
  });

  it('CSV: states the release and cites the sources in # lines, then one row per value or fit', async () => {
    const res = await exported('format=csv&release=2026.2').expect(200);
    expect(res.headers['content-type']).toContain('text/csv');
    expect(res.headers['content-disposition']).toBe('attachment; filename="kelvindex-2026.2.csv"');
    const body = text(res);
    const comments = body.split('\n').filter((l) => l.startsWith('#'));
    expect(comments.join('\n')).toContain('release 2026.2 (published 2026-06-15T10:00:00.000Z)');
    for (const key of ['codata-1989', 'nbs-1982', 'janaf-1998', 'nasa-tm-4513']) expect(comments.join('\n')).toContain(`[${key}]`);
    expect(comments.join('\n')).toContain('Cox, J. D.; Wagman, D. D.; Medvedev, V. A. CODATA Key Values for Thermodynamics');
    const rows = parseCsv(body.split('\n').filter((l) => !l.startsWith('#')).join('\n'));
    expect(rows[0]).toEqual(EXPORT_COLUMNS as string[]);
    const data = rows.slice(1);
    expect(data.length).toBe(members.find((m) => m.release === '2026.2')!.n);
    expect(data.every((r) => r.length === EXPORT_COLUMNS.length)).toBeTrue();
    const column = (name: string) => EXPORT_COLUMNS.indexOf(name as never);
    const water = data.find((r) => r[column('formula')] === 'H2O' && r[column('record_kind')] === 'fit')!;
    expect(JSON.parse(water[column('fit_ranges')])[0].coefficients).toEqual(TM4513.H2O.ranges[0].coefficients as number[]);
    const methane = data.find((r) => r[column('formula')] === 'CH4' && r[column('quantity')] === 'dfH' && r[column('recommended')] === 'true')!;
    expect([methane[column('value')], methane[column('unit')], methane[column('source_key')]]).toEqual(['-74873', 'J/mol', 'janaf-1998']);
  });

  it('applies the search filters and recommendedOnly', async () => {
    const res = await exported('format=csv&formula=H2O&phase=l&quantity=S&release=2026.2').expect(200);
    const rows = parseCsv(text(res).split('\n').filter((l) => !l.startsWith('#')).join('\n')).slice(1);
    // S°(H2O, l): CODATA 1989 (recommended), JANAF 1998, NBS 1982.
    expect(rows.map((r) => r[EXPORT_COLUMNS.indexOf('source_key')]).sort()).toEqual(['codata-1989', 'janaf-1998', 'nbs-1982']);
    const recommended = await exported('format=csv&recommendedOnly=true&release=2026.1').expect(200);
    const count = parseCsv(text(recommended).split('\n').filter((l) => !l.startsWith('#')).join('\n')).length - 1;
    expect(count).toBe(members.find((m) => m.release === '2026.1')!.recommended);
  });

  it('JSON: a kelvindex header object, then the species with their values and fits', async () => {
    const res = await exported('format=json&release=2026.1').expect(200);
    const doc = JSON.parse(text(res));
    expect(doc.kelvindex.release).toEqual({ label: '2026.1', status: 'published', publishedAt: '2026-01-26T10:00:00.000Z' });
    expect(doc.kelvindex.sources.map((s: { key: string }) => s.key)).toEqual(['codata-1989', 'nasa-tm-4513', 'nbs-1982']);
    const values = doc.species.flatMap((s: { phases: { values: unknown[]; fits: unknown[] }[] }) => s.phases.flatMap((p) => [...p.values, ...p.fits]));
    expect(values.length).toBe(members.find((m) => m.release === '2026.1')!.n);
    const nitrogen = doc.species.find((s: { formula: string }) => s.formula === 'N2');
    expect(nitrogen.phases[0].fits[0]).toEqual(jasmine.objectContaining({ form: 'nasa7', tMin: 200, tMax: 6000, source: 'nasa-tm-4513', recommended: true }));
    const empty = JSON.parse(text(await exported('format=json&formula=Xe').expect(200)));
    expect(empty.species).toEqual([]);
  });

  it('XML: well-formed, the release as attributes, sources, then one species element each', async () => {
    const res = await exported('format=xml&release=2026.2').expect(200);
    expect(res.headers['content-type']).toContain('application/xml');
    const xml = text(res);
    expect(XMLValidator.validate(xml)).toBeTrue();
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '', isArray: (name, _path, _leaf, attribute) => !attribute && ['species', 'phase', 'value', 'fit', 'range', 'coefficient', 'source'].includes(name) }).parse(xml);
    const root = doc.kelvindexExport;
    expect([root.release, root.releaseStatus, root.publishedAt]).toEqual(['2026.2', 'published', '2026-06-15T10:00:00.000Z']);
    expect(root.sources.source.map((s: { key: string }) => s.key)).toContain('codata-1989');
    expect(root.sources.source[0].citation).toEqual(jasmine.any(String));
    const count = root.species.reduce((n: number, s: { phase: { value?: unknown[]; fit?: unknown[] }[] }) => n + s.phase.reduce((m, p) => m + (p.value?.length ?? 0) + (p.fit?.length ?? 0), 0), 0);
    expect(count).toBe(members.find((m) => m.release === '2026.2')!.n);
    const water = root.species.find((s: { formula: string }) => s.formula === 'H2O');
    const gas = water.phase.find((p: { code: string }) => p.code === 'g');
    expect(gas.fit[0].range[0].coefficient.map((c: { '#text': number }) => c['#text'])).toEqual(TM4513.H2O.ranges[0].coefficients as number[]);
    const dfH = gas.value.find((v: { quantity: string; recommended: string }) => v.quantity === 'dfH' && v.recommended === 'true');
    expect([dfH['#text'], dfH.unit, dfH.source, dfH.uncertaintyKind]).toEqual([-241826, 'J/mol', 'codata-1989', 'expanded']);
  });

  it('NASA-7: the TM-4513 80-column layout, four lines per species, with ! comments', async () => {
    const res = await exported('format=nasa7&release=2026.2').expect(200);
    const lines = text(res).split('\n').filter((l) => l !== '');
    const comments = lines.filter((l) => l.startsWith('!'));
    expect(comments.join('\n')).toContain('release 2026.2');
    expect(comments.join('\n')).toContain('[nasa-tm-4513] McBride, B. J.; Gordon, S.; Reno, M. A.');
    const records = lines.filter((l) => !l.startsWith('!'));
    expect(records[0]).toBe('THERMO');
    expect(records[records.length - 1]).toBe('END');
    const cards = records.slice(2, -1);
    // 2026.2 recommends a TM-4513 polynomial for eight gases (seeds-demo/reference-set.ts).
    expect(cards.length).toBe(8 * 4);
    expect(cards.filter((_, i) => i % 4 === 0).map((c) => c.slice(0, 18).trim()).sort()).toEqual(['CH4', 'CO', 'CO2', 'H2', 'H2O', 'N2', 'NH3', 'O2']);
    for (const [i, card] of cards.entries()) {
      expect(card.length).withContext(card).toBe(80);
      expect(card[79]).toBe(String((i % 4) + 1));
    }
    // First water card: name 1–18, release label as date code 19–24, H 2 O 1 in 25–44, G in 45, T in 46–73.
    const water = cards.findIndex((c) => c.startsWith('H2O '));
    const line1 = cards[water];
    expect(line1.slice(0, 18).trim()).toBe('H2O');
    expect(line1.slice(18, 24)).toBe('2026.2');
    expect(line1.slice(24, 44)).toBe('H   2O   1          ');
    expect(line1[44]).toBe('G');
    expect([Number(line1.slice(45, 55)), Number(line1.slice(55, 65)), Number(line1.slice(65, 73))]).toEqual([200, 6000, 1000]);
    // Coefficients read back from 15-column fields: upper range a1–a7, then lower range a1–a7.
    const fields = cards.slice(water + 1, water + 4).flatMap((c) => c.slice(0, 75).match(/.{15}/g)!.map(Number)).filter((_, i) => i < 14);
    expect(fields.slice(0, 7)).toEqual(TM4513.H2O.ranges[1].coefficients as number[]);
    expect(fields.slice(7, 14)).toEqual(TM4513.H2O.ranges[0].coefficients as number[]);
    // 2026.1 holds the N2 polynomial only.
    const older = await exported('format=nasa7&release=2026.1').expect(200);
    expect(text(older).split('\n').filter((l) => l.length === 80 && l.endsWith('1')).map((l) => l.slice(0, 18).trim())).toEqual(['N2']);
  });

  it('caches a named published release (ETag, 304) and streams a release in preparation to editors only', async () => {
    const first = await exported('format=csv&formula=CH4&release=2026.1').expect(200);
    expect(first.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(first.headers.etag).toMatch(/^W\/"x-/);
    await request(t.app).get('/api/v1/export?format=csv&formula=CH4&release=2026.1').set('If-None-Match', first.headers.etag).expect(304);
    const other = await exported('format=json&formula=CH4&release=2026.1').expect(200);
    expect(other.headers.etag).not.toBe(first.headers.etag);
    await exported('format=csv&release=2027.1').expect(404);
    const preparing = await exported('format=csv&release=2027.1').set('Authorization', await bearerFor(t.app, 'editor')).expect(200);
    expect(preparing.headers['cache-control']).toBe('private, no-store');
    expect(text(preparing)).toContain('release 2027.1 (in preparation, not published)');
  });

  it('refuses an unknown format and malformed filters', async () => {
    expect((await request(t.app).get('/api/v1/export?format=xlsx').expect(400)).body.message).toContain('format');
    expect((await request(t.app).get('/api/v1/export?formula=H2Xx').expect(400)).body.details).toEqual(jasmine.objectContaining({ parameter: 'formula', column: 2 }));
    await request(t.app).get('/api/v1/export?release=2026').expect(400);
    await request(t.app).get('/api/v1/export?recommendedOnly=maybe').expect(400);
    await request(t.app).get('/api/v1/export?page=2').expect(400);
  });
});
