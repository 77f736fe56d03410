import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';
import { ApiKey } from './api-key.entity';

describe('API keys', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await testApp();
  });

  it('shows the secret once, stores only its hash, and authenticates with X-API-Key or Bearer', async () => {
    const reader = await bearerFor(t.app, 'reader');
    const created = await request(t.app).post('/api/v1/api-keys').set('Authorization', reader).send({ name: `plant simulator ${Date.now()}` }).expect(201);
    expect(created.body.scope).toBe('read');
    const secret: string = created.body.secret;
    expect(secret).toMatch(/^kx[A-Za-z0-9]{10}\./);

    const row = await t.dataSource.getRepository(ApiKey).createQueryBuilder('k').addSelect('k.secretHash').where('k.id = :id', { id: created.body.id }).getOneOrFail();
    expect(row.secretHash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.secretHash).not.toContain(secret.split('.')[1]);

    const listed = await request(t.app).get('/api/v1/api-keys').set('Authorization', reader).expect(200);
    const item = listed.body.items.find((k: { id: string }) => k.id === created.body.id);
    expect(item.secret).toBeUndefined();

    const viaHeader = await request(t.app).get('/api/v1/auth/me').set('X-API-Key', secret).expect(200);
    expect(viaHeader.body.via).toBe('api-key');
    await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${secret}`).expect(200);
    const used = await t.dataSource.getRepository(ApiKey).findOneByOrFail({ id: created.body.id });
    expect(used.lastUsedAt).not.toBeNull();
  });

  it('keeps read-only keys from writing and refuses revoked or forged keys', async () => {
    const admin = await bearerFor(t.app, 'admin');
    const created = await request(t.app).post('/api/v1/api-keys').set('Authorization', admin).send({ name: `read-only admin key ${Date.now()}` }).expect(201);
    const key = created.body.secret as string;
    const write = await request(t.app).post('/api/v1/users/invitations').set('X-API-Key', key).send({ email: 'x@kelvindex.test', roles: ['reader'] }).expect(403);
    expect(write.body.message).toContain('read-only');
    await request(t.app).get('/api/v1/users').set('X-API-Key', key).expect(200);

    await request(t.app).delete(`/api/v1/api-keys/${created.body.id}`).set('Authorization', admin).expect(204);
    const revoked = await request(t.app).get('/api/v1/auth/me').set('X-API-Key', key).expect(401);
    expect(revoked.body.message).toContain('revoked');
    const [prefix] = key.split('.');
    await request(t.app).get('/api/v1/auth/me').set('X-API-Key', `${prefix}.${'A'.repeat(43)}`).expect(401);
    await request(t.app).get('/api/v1/auth/me').set('X-API-Key', 'not-a-key').expect(401);
  });

  it('does not let one user revoke another user\'s key', async () => {
    const steward = await bearerFor(t.app, 'steward');
    const created = await request(t.app).post('/api/v1/api-keys').set('Authorization', steward).send({ name: `mine ${Date.now()}` }).expect(201);
    const reader = await bearerFor(t.app, 'reader');
    await request(t.app).delete(`/api/v1/api-keys/${created.body.id}`).set('Authorization', reader).expect(404);
    await request(t.app).get('/api/v1/auth/me').set('X-API-Key', created.body.secret).expect(200);
  });
});
