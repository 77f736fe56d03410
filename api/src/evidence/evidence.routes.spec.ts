import { createHash, randomBytes } from 'node:crypto';
import request from 'supertest';
import { seedId } from '../../../seeds-demo/seed-support';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor, type DemoRole } from '../testing/sign-in';

// Uploads on the shared demo database; every refused upload must leave the rows as they were.
describe('evidence files', () => {
  let t: TestApp;
  const auth: Partial<Record<DemoRole, string>> = {};
  let proposalId: string;
  let itemId: string;
  const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), randomBytes(64)]);
  const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1');

  const url = () => `/api/v1/proposals/${proposalId}/items/${itemId}/evidence`;
  const upload = (who: DemoRole = 'steward') => request(t.app).post(url()).set('Authorization', auth[who]!);
  const stored = async () => (await t.dataSource.query(`SELECT count(*)::int AS n FROM evidence_files`))[0].n as number;

  beforeAll(async () => {
    t = await testApp();
    for (const who of ['steward', 'reviewer', 'editor', 'reader', 'admin'] as const) auth[who] = await bearerFor(t.app, who);
    const steward = auth.steward!;
    const source = await request(t.app).post('/api/v1/sources').set('Authorization', steward).send({ type: 'report', title: `Evidence spec ${randomBytes(3).toString('hex')}` }).expect(201);
    const proposal = await request(t.app).post('/api/v1/proposals').set('Authorization', steward).send({ title: 'Evidence spec' }).expect(201);
    proposalId = proposal.body.id;
    const item = await request(t.app).post(`/api/v1/proposals/${proposalId}/items`).set('Authorization', steward).send({
      kind: 'add_value', sourceId: source.body.id,
      payload: { speciesPhaseId: seedId('phase', 'CO2(g)'), quantity: 'S', value: '213.80', unit: 'J/(mol·K)', pressurePa: 100000, method: 'evaluated' },
    }).expect(201);
    itemId = item.body.id;
  });

  it('stores a PDF checked by content with its SHA-256, and serves it to those who may see the proposal', async () => {
    const res = await upload().attach('file', PDF, { filename: '../../etc/report.pdf', contentType: 'application/pdf' }).expect(201);
    expect(res.body).toEqual(jasmine.objectContaining({ fileName: 'report.pdf', mediaType: 'application/pdf', sizeBytes: PDF.length, sha256: createHash('sha256').update(PDF).digest('hex'), itemId, proposalId }));
    const back = await request(t.app).get(`/api/v1/evidence/${res.body.id}`).set('Authorization', auth.steward!).buffer(true)
      .parse((r, done) => { const c: Buffer[] = []; r.on('data', (d: Buffer) => c.push(d)); r.on('end', () => done(null, Buffer.concat(c))); }).expect(200);
    expect(Buffer.compare(back.body as Buffer, PDF)).toBe(0);
    expect(back.headers['content-type']).toBe('application/pdf');
    expect(back.headers.etag).toBe(`"${res.body.sha256}"`);
    // A draft is its author's: reviewers see it once it is submitted.
    await request(t.app).get(`/api/v1/evidence/${res.body.id}`).set('Authorization', auth.reviewer!).expect(403);
    await request(t.app).get(`/api/v1/evidence/${res.body.id}`).set('Authorization', auth.reader!).expect(403);
    await request(t.app).get('/api/v1/evidence/00000000-0000-4000-8000-000000000000').set('Authorization', auth.steward!).expect(404);
    const meta = await request(t.app).get(`/api/v1/evidence/${res.body.id}?meta=true`).set('Authorization', auth.steward!).expect(200);
    expect(meta.body.sha256).toBe(res.body.sha256);
    await request(t.app).get(`/api/v1/evidence/${res.body.id}`).expect(401);
  });

  it('refuses an oversized file with 413 and stores nothing', async () => {
    const before = await stored();
    const big = Buffer.alloc(t.config.uploadLimitBytes + 1, 0x41);
    const res = await upload().attach('file', big, { filename: 'big.txt', contentType: 'text/plain' });
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/larger than the upload limit/);
    expect(await stored()).toBe(before);
  });

  it('refuses content that is not what it claims (415), empty and malformed uploads (422/400), and stores nothing', async () => {
    const before = await stored();
    const mismatch = await upload().attach('file', PNG, { filename: 'figure.pdf', contentType: 'application/pdf' }).expect(415);
    expect(mismatch.body.message).toBe('The file was declared as application/pdf but its content is a PNG image');
    const binary = await upload().attach('file', Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00]), { filename: 'tool.exe', contentType: 'application/octet-stream' }).expect(415);
    expect(binary.body.message).toMatch(/not one of the accepted kinds/);
    await upload().attach('file', Buffer.from('{"a": 1'), { filename: 'data.json', contentType: 'application/json' }).expect(415);
    await upload().attach('file', Buffer.from('plain words'), { filename: 'a.doc', contentType: 'application/msword' }).expect(415);
    await upload().attach('file', Buffer.alloc(0), { filename: 'empty.txt', contentType: 'text/plain' }).expect(422);
    const broken = await upload().set('Content-Type', 'multipart/form-data; boundary=XYZ').send('--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.txt"\r\n\r\nunterminated');
    expect(broken.status).toBe(400);
    await upload().send({ file: 'not multipart' }).expect(400);
    await upload().attach('other', PDF, { filename: 'a.pdf', contentType: 'application/pdf' }).expect(400);
    await upload('reviewer').attach('file', PDF, { filename: 'a.pdf', contentType: 'application/pdf' }).expect(403);
    expect(await stored()).toBe(before);
  });

  it('takes evidence only while the author may change the items', async () => {
    await request(t.app).post(`/api/v1/proposals/${proposalId}/submit`).set('Authorization', auth.steward!).send({}).expect(200);
    const before = await stored();
    const res = await upload().attach('file', PDF, { filename: 'late.pdf', contentType: 'application/pdf' }).expect(409);
    expect(res.body.message).toMatch(/draft or changes are requested/);
    expect(await stored()).toBe(before);
    // Submitted: now the reviewers may read the earlier upload.
    const [first] = await t.dataSource.query(`SELECT id FROM evidence_files WHERE proposal_item_id = $1`, [itemId]);
    await request(t.app).get(`/api/v1/evidence/${first.id}`).set('Authorization', auth.reviewer!).expect(200);
    await request(t.app).get(`/api/v1/evidence/${first.id}`).set('Authorization', auth.editor!).expect(200);
  });
});
