import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor, type DemoRole } from '../testing/sign-in';

// Sources on the shared demo database; every DOI here is made up for the spec (prefix 10.5555 is
// the DOI Foundation's test prefix) and carries a random tag so that reruns do not collide.
describe('sources', () => {
  let t: TestApp;
  const auth: Partial<Record<DemoRole, string>> = {};
  const call = (who: DemoRole, method: 'get' | 'post', path: string) => request(t.app)[method](`/api/v1${path}`).set('Authorization', auth[who]!);
  const tag = () => randomBytes(4).toString('hex');
  const count = async () => (await t.dataSource.query(`SELECT count(*)::int AS n FROM sources`))[0].n as number;

  beforeAll(async () => {
    t = await testApp();
    for (const who of ['steward', 'editor', 'reviewer', 'reader'] as const) auth[who] = await bearerFor(t.app, who);
  });

  it('imports BibTeX and RIS through citation-js, and exports CSL-JSON and BibTeX', async () => {
    const [a, b] = [tag(), tag()];
    const bib = `@book{cox1989${a},\n  author = {Cox, J. D. and Wagman, D. D. and Medvedev, V. A.},\n  title = {{CODATA} Key Values for Thermodynamics ${a}},\n  publisher = {Hemisphere},\n  year = {1989},\n  doi = {10.5555/KX.${a}}\n}`;
    const fromBib = (await call('steward', 'post', '/sources/import').send({ text: bib }).expect(201)).body;
    expect(fromBib.format).toBe('bibtex');
    const cox = fromBib.items[0];
    expect(cox).toEqual(jasmine.objectContaining({ doi: `10.5555/kx.${a}`, year: 1989, title: `CODATA Key Values for Thermodynamics ${a}` }));
    expect(cox.shortKey).toMatch(/^cox-1989/);
    expect(cox.csl.type).toBe('book');
    expect(cox.csl.author.map((n: { family: string }) => n.family)).toEqual(['Cox', 'Wagman', 'Medvedev']);

    const ris = `TY  - JOUR\nAU  - Chase, M. W.\nTI  - Thermochemical tables ${b}\nT2  - Journal of Physical and Chemical Reference Data\nPY  - 1998\nDO  - 10.5555/kx.${b}\nER  - \n`;
    const fromRis = (await call('editor', 'post', '/sources/import').send({ text: ris }).expect(201)).body;
    expect(fromRis.format).toBe('ris');
    expect(fromRis.items[0]).toEqual(jasmine.objectContaining({ doi: `10.5555/kx.${b}`, year: 1998 }));

    const csl = await request(t.app).get(`/api/v1/sources/${cox.id}?format=csl-json`).expect(200);
    expect(csl.headers['content-type']).toContain('application/vnd.citationstyles.csl+json');
    expect(JSON.parse(csl.text)).toEqual(jasmine.objectContaining({ id: cox.shortKey, DOI: `10.5555/kx.${a}`, type: 'book' }));
    const bibtex = await request(t.app).get(`/api/v1/sources/${cox.id}?format=bibtex`).expect(200);
    expect(bibtex.headers['content-type']).toContain('application/x-bibtex');
    expect(bibtex.text).toMatch(new RegExp(`^@book\\{${cox.shortKey},`));
    expect(bibtex.text).toContain(`doi = {10.5555/kx.${a}}`);
    await request(t.app).get(`/api/v1/sources/${cox.id}?format=docx`).expect(400);

    const found = (await request(t.app).get(`/api/v1/sources?q=${encodeURIComponent(`https://doi.org/10.5555/KX.${a}`)}`).expect(200)).body;
    expect(found.items[0].id).toBe(cox.id);
    const byTitle = (await request(t.app).get(`/api/v1/sources?q=${a}`).expect(200)).body;
    expect(byTitle.items.map((s: { id: string }) => s.id)).toContain(cox.id);
  });

  it('detects duplicates by DOI (409 naming the existing source) and writes nothing', async () => {
    const a = tag();
    const first = (await call('steward', 'post', '/sources').send({ type: 'article-journal', title: `Heat of formation ${a}`, author: [{ family: 'Okafor', given: 'T.' }], issued: { 'date-parts': [[2024, 5]] }, DOI: `10.5555/dup.${a}` }).expect(201)).body;
    expect(first.shortKey).toMatch(/^okafor-2024/);
    const before = await count();
    const again = await call('steward', 'post', '/sources').send({ type: 'article-journal', title: 'Same paper, typed again', DOI: `https://doi.org/10.5555/DUP.${a}` }).expect(409);
    expect(again.body.message).toContain(first.shortKey);
    expect(again.body.details.existing[0].id).toBe(first.id);
    const bib = `@article{x${a}, title = {Other}, year = {2020}, doi = {10.5555/new.${a}}}\n@article{y${a}, title = {Dup}, year = {2024}, doi = {10.5555/dup.${a}}}`;
    const batch = await call('steward', 'post', '/sources/import').send({ text: bib }).expect(409);
    expect(batch.body.message).toContain(first.shortKey);
    expect(await count()).toBe(before);
  });

  it('creates a minimal record from a DOI alone and says that no lookup was made', async () => {
    const a = tag();
    const res = (await call('steward', 'post', '/sources').send({ doi: `doi:10.5555/Offline.${a}` }).expect(201)).body;
    expect(res.doi).toBe(`10.5555/offline.${a}`);
    expect(res.title).toBe(`DOI 10.5555/offline.${a}`);
    expect(res.notice).toMatch(/no network lookups/);
    await call('steward', 'post', '/sources').send({ doi: 'not a doi' }).expect(422);
  });

  it('refuses malformed input with the reason', async () => {
    const before = await count();
    await call('steward', 'post', '/sources').send({ title: '' }).expect(400);
    await call('steward', 'post', '/sources').send({ title: 'x', colour: 'blue' }).expect(400);
    await call('steward', 'post', '/sources').send({ title: 'x', type: 'novel' }).expect(400);
    await call('steward', 'post', '/sources').send({ title: 'x', issued: { 'date-parts': [['spring']] } }).expect(400);
    await call('steward', 'post', '/sources').send({ title: 'x', author: ['Cox'] }).expect(400);
    await call('steward', 'post', '/sources').send({ title: 'x', shortKey: 'no spaces allowed' }).expect(400);
    const neither = await call('steward', 'post', '/sources/import').send({ text: 'Cox, J. D. (1989) CODATA Key Values' }).expect(422);
    expect(neither.body.message).toMatch(/neither BibTeX .* nor RIS/);
    await call('steward', 'post', '/sources/import').send({ text: '@article{broken, title = {no end' }).expect(422);
    await call('reader', 'post', '/sources').send({ title: 'x' }).expect(403);
    expect(await count()).toBe(before);
  });

  it('lets editors merge a duplicate: open items follow, values keep their citation, the duplicate points at the source kept', async () => {
    const a = tag();
    const kept = (await call('editor', 'post', '/sources').send({ type: 'report', title: `Kept ${a}` }).expect(201)).body;
    const duplicate = (await call('steward', 'post', '/sources').send({ type: 'report', title: `Kept (typed twice) ${a}`, DOI: `10.5555/merge.${a}` }).expect(201)).body;
    const proposal = (await call('steward', 'post', '/proposals').send({ title: 'Merge spec' }).expect(201)).body;
    await call('steward', 'post', `/proposals/${proposal.id}/items`).send({
      kind: 'add_value', sourceId: duplicate.id,
      payload: { speciesId: undefined, species: 'methane', phase: 'g', quantity: 'S', value: '186.25', unit: 'J/(mol·K)', pressurePa: 100000, method: 'evaluated' },
    }).expect(201);
    await call('steward', 'post', `/sources/${duplicate.id}/merge`).send({ intoId: kept.id }).expect(403);
    const merged = (await call('editor', 'post', `/sources/${duplicate.id}/merge`).send({ intoId: kept.id }).expect(200)).body;
    expect(merged).toEqual(jasmine.objectContaining({ repointedItems: 1, doiMoved: true }));
    expect(merged.merged.mergedIntoId).toBe(kept.id);
    expect(merged.into.doi).toBe(`10.5555/merge.${a}`);
    const [item] = await t.dataSource.query(`SELECT source_id FROM proposal_items WHERE proposal_id = $1`, [proposal.id]);
    expect(item.source_id).toBe(kept.id);
    const list = (await request(t.app).get(`/api/v1/sources?q=${a}`).expect(200)).body.items.map((s: { id: string }) => s.id);
    expect(list).toEqual([kept.id]);
    await call('editor', 'post', `/sources/${duplicate.id}/merge`).send({ intoId: kept.id }).expect(409);
    await call('editor', 'post', `/sources/${kept.id}/merge`).send({ intoId: kept.id }).expect(422);
  });
});
