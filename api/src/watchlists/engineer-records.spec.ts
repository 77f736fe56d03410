import { randomBytes, randomUUID } from 'node:crypto';
import request from 'supertest';
import { seedId } from '../../../seeds-demo/seed-support';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';

// What engineers keep for themselves: a watchlist, saved reactions, display preferences.
describe("an engineer's own records", () => {
  let t: TestApp;
  let editor: string;
  const call = (method: 'get' | 'post' | 'put' | 'delete', path: string) => request(t.app)[method](`/api/v1${path}`).set('Authorization', editor);

  beforeAll(async () => {
    t = await testApp();
    editor = await bearerFor(t.app, 'editor');
  });

  it('watchlist: watch and unwatch species, idempotently, in the exact shape', async () => {
    const methane = seedId('species', 'CH4');
    const first = await call('put', `/watchlist/${methane}`).expect(201);
    expect(first.body).toEqual({ speciesId: methane, formula: 'CH4', name: 'methane', createdAt: jasmine.any(String) });
    await call('put', `/watchlist/${methane}`).expect(200);
    const list = (await call('get', '/watchlist').expect(200)).body;
    expect(Object.keys(list)).toEqual(['items']);
    expect(list.items.filter((i: { speciesId: string }) => i.speciesId === methane)).toEqual([first.body]);
    await call('put', `/watchlist/${randomUUID()}`).expect(404);
    await call('put', '/watchlist/methane').expect(400);
    await call('delete', `/watchlist/${methane}`).expect(204);
    expect((await call('get', '/watchlist').expect(200)).body.items.some((i: { speciesId: string }) => i.speciesId === methane)).toBeFalse();
    await request(t.app).get('/api/v1/watchlist').expect(401);
  });

  it('saved reactions: parsed, balanced and tied to the species phases they use', async () => {
    const name = `Methanol synthesis ${randomBytes(3).toString('hex')}`;
    const saved = await call('post', '/saved-reactions').send({ name, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', tMin: 298.15, tMax: 800 }).expect(201);
    expect(saved.body).toEqual({ id: jasmine.any(String), name, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', tMin: 298.15, tMax: 800, createdAt: jasmine.any(String) });
    const terms: { species_phase_id: string; coefficient: number }[] = await t.dataSource.query(
      `SELECT species_phase_id, coefficient FROM saved_reaction_terms WHERE saved_reaction_id = $1 ORDER BY coefficient`, [saved.body.id]);
    expect(terms).toEqual([
      { species_phase_id: seedId('phase', 'H2(g)'), coefficient: -2 },
      { species_phase_id: seedId('phase', 'CO(g)'), coefficient: -1 },
      { species_phase_id: seedId('phase', 'CH3OH(g)'), coefficient: 1 },
    ]);
    const list = (await call('get', '/saved-reactions').expect(200)).body;
    expect(list.items).toContain(saved.body);
    await call('post', '/saved-reactions').send({ name, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', tMin: 298.15, tMax: 800 }).expect(409);
    const unbalanced = await call('post', '/saved-reactions').send({ name: 'x', equation: 'CO(g) + H2(g) -> CH3OH(g)', tMin: 300, tMax: 400 }).expect(422);
    expect(unbalanced.body.message).toMatch(/unbalanced: H: 2 on the left, 4 on the right/);
    await call('post', '/saved-reactions').send({ name: 'x', equation: 'CO + 2 H2 -> CH3OH', tMin: 300, tMax: 400 }).expect(422);
    const unknown = await call('post', '/saved-reactions').send({ name: 'x', equation: 'Xe(g) + F2(g) -> XeF2(cr)', tMin: 300, tMax: 400 }).expect(422);
    expect(unknown.body.message).toBe('Xe(g) is not in the catalogue');
    await call('post', '/saved-reactions').send({ name: 'x', equation: 'CO(g) -> CO(g)', tMin: 300, tMax: 400 }).expect(422);
    await call('post', '/saved-reactions').send({ name: 'x', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', tMin: 500, tMax: 400 }).expect(422);
    await call('post', '/saved-reactions').send({ name: 'x', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', tMin: -5, tMax: 400 }).expect(400);
    await request(t.app).delete(`/api/v1/saved-reactions/${saved.body.id}`).set('Authorization', await bearerFor(t.app, 'reader')).expect(404);
    await call('delete', `/saved-reactions/${saved.body.id}`).expect(204);
    await call('delete', `/saved-reactions/${saved.body.id}`).expect(404);
  });

  it('preferences: the energy unit, kJ by default', async () => {
    const reviewer = await bearerFor(t.app, 'reviewer');
    expect((await request(t.app).get('/api/v1/me/preferences').set('Authorization', reviewer).expect(200)).body).toEqual({ energyUnit: 'kJ' });
    await request(t.app).put('/api/v1/me/preferences').set('Authorization', reviewer).send({ energyUnit: 'kcal' }).expect(200, { energyUnit: 'kcal' });
    expect((await request(t.app).get('/api/v1/me/preferences').set('Authorization', reviewer).expect(200)).body).toEqual({ energyUnit: 'kcal' });
    await request(t.app).put('/api/v1/me/preferences').set('Authorization', reviewer).send({ energyUnit: 'eV' }).expect(400);
    await request(t.app).put('/api/v1/me/preferences').set('Authorization', reviewer).send({ energyUnit: 'kJ' }).expect(200);
  });
});
