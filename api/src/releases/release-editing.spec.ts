import { randomBytes, randomUUID } from 'node:crypto';
import request from 'supertest';
import { seedId } from '../../../seeds-demo/seed-support';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';

// The editor's release routes on the shared demo data (2026.1 and 2026.2 published, 2027.1 in
// preparation); nothing here publishes (see editorial-cycle.spec for that, on its own database).
describe('release editing', () => {
  let t: TestApp;
  let editor: string;
  const call = (method: 'post' | 'put' | 'patch', path: string) => request(t.app)[method](`/api/v1${path}`).set('Authorization', editor);
  const members = async () => (await t.dataSource.query(`SELECT count(*)::int AS n FROM release_members`))[0].n as number;

  beforeAll(async () => {
    t = await testApp();
    editor = await bearerFor(t.app, 'editor');
  });

  it('shows the editor the release in preparation: its proposals, the groups needing a recommendation and the change log', async () => {
    const workspace = await request(t.app).get('/api/v1/releases/2027.1/workspace').set('Authorization', editor).expect(200);
    expect(workspace.body).toEqual(jasmine.objectContaining({ label: '2027.1', status: 'preparing' }));
    expect(workspace.body.proposals.map((p: { id: string }) => p.id)).toContain(seedId('proposal', 'approved-ethyl-acetate'));
    expect(Array.isArray(workspace.body.needsRecommendation)).toBeTrue();
    expect(workspace.body.changeLog).toEqual(jasmine.objectContaining({ release: '2027.1', comparedWith: '2026.2' }));
    expect(workspace.body.changeLog.species.some((s: { name: string }) => /ethyl acetate/i.test(s.name))).toBeTrue();
    await request(t.app).get('/api/v1/releases/2027.1/workspace').set('Authorization', await bearerFor(t.app, 'steward')).expect(403);
    await request(t.app).get('/api/v1/releases/1999.1/workspace').set('Authorization', editor).expect(404);
  });

  it('opens a release only after the one in preparation is published, and only after the latest label', async () => {
    const preparing = await call('post', '/releases').send({ label: '2027.2' }).expect(409);
    expect(preparing.body.message).toMatch(/2027\.1 is in preparation/);
    await call('post', '/releases').send({ label: '2026.2' }).expect(409);
    await call('post', '/releases').send({ label: '2027-2' }).expect(400);
    await request(t.app).post('/api/v1/releases').set('Authorization', await bearerFor(t.app, 'steward')).send({ label: '2028.1' }).expect(403);
  });

  it('refuses to change a published release and to publish without confirmation or with a stale version', async () => {
    const before = await members();
    const published = await call('patch', '/releases/2026.2').send({ notes: 'edited' }).expect(409);
    expect(published.body.message).toMatch(/published and can no longer change/);
    await call('post', '/releases/2026.1/publish').send({ confirm: true }).expect(409);
    await call('post', '/releases/2027.1/publish').send({ confirm: false }).expect(400);
    await call('post', '/releases/2027.1/publish').send({ confirm: true, version: 999 }).expect(409);
    await call('post', '/releases/1999.1/publish').send({ confirm: true }).expect(404);
    expect(await members()).toBe(before);
  });

  it('takes only approved proposals, and recommendations only for members of the release', async () => {
    const steward = await bearerFor(t.app, 'steward');
    const draft = await request(t.app).post('/api/v1/proposals').set('Authorization', steward).send({ title: `Release spec ${randomBytes(3).toString('hex')}` }).expect(201);
    await call('post', '/releases/2027.1/proposals').send({ proposalId: draft.body.id }).expect(404);
    const [submitted] = await t.dataSource.query(`SELECT id FROM proposals WHERE state = 'submitted' LIMIT 1`);
    const notApproved = await call('post', '/releases/2027.1/proposals').send({ proposalId: submitted.id }).expect(409);
    expect(notApproved.body.message).toMatch(/Only approved proposals/);
    const already = await call('post', '/releases/2027.1/proposals').send({ proposalId: seedId('proposal', 'approved-ethyl-acetate') }).expect(409);
    expect(already.body.message).toMatch(/already in release 2027\.1/);
    await call('post', '/releases/2026.2/proposals').send({ proposalId: seedId('proposal', 'approved-ethyl-acetate') }).expect(409);

    const before = await members();
    const water = seedId('phase', 'H2O(l)');
    await call('put', '/releases/2027.1/recommended').send({ speciesPhaseId: water, quantity: 'dfH', valueId: randomUUID() }).expect(422);
    await call('put', '/releases/2027.1/recommended').send({ speciesPhaseId: water, quantity: 'S', valueId: seedId('value', 'codata-1989:H2O(l):dfH') }).expect(422);
    await call('put', '/releases/2027.1/recommended').send({ speciesPhaseId: water, quantity: 'dfH' }).expect(400);
    const kept = await call('put', '/releases/2027.1/recommended').send({ speciesPhaseId: water, quantity: 'dfH', valueId: seedId('value', 'codata-1989:H2O(l):dfH') }).expect(200);
    expect(kept.body.members[0]).toEqual(jasmine.objectContaining({ valueId: seedId('value', 'codata-1989:H2O(l):dfH'), recommended: true }));
    expect(await members()).toBe(before);
  });
});
