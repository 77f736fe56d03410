import request from 'supertest';
import { SignJWT } from 'jose';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor, refreshCookie } from '../testing/sign-in';
import { tokenFromMail, waitForMail } from '../testing/outbox';
import { DEMO_PASSWORD } from '../../../seeds-demo/demo-accounts';
import { AuditEntry } from '../audit/audit-entry.entity';

const login = (t: TestApp, email: string, password: string) => request(t.app).post('/api/v1/auth/login').send({ email, password });

describe('sign-in, tokens and sessions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await testApp();
  });

  it('signs in with e-mail and password and returns the token, the user and an httpOnly SameSite=Strict refresh cookie', async () => {
    const res = await login(t, 'steward@kelvindex.test', DEMO_PASSWORD).expect(200);
    expect(res.body.accessToken.split('.').length).toBe(3);
    expect(res.body.expiresIn).toBe(t.config.accessTokenSeconds);
    expect(res.body.user).toEqual(jasmine.objectContaining({ email: 'steward@kelvindex.test', roles: jasmine.arrayContaining(['steward']) }));
    const cookie = ([] as string[]).concat(res.headers['set-cookie']).find((c) => c.startsWith('kx_refresh='))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Strict/i);
    const me = await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${res.body.accessToken}`).expect(200);
    expect(me.body.email).toBe('steward@kelvindex.test');
  });

  it('answers a wrong password and an unknown address with the same generic message, and audits both', async () => {
    const wrong = await login(t, 'reader@kelvindex.test', 'not-the-password').expect(401);
    const unknown = await login(t, 'nobody-here@kelvindex.test', 'whatever-password').expect(401);
    expect(wrong.body.message).toBe('E-mail or password is wrong');
    expect(unknown.body.message).toBe(wrong.body.message);
    const audited = await t.dataSource.getRepository(AuditEntry).countBy({ action: 'auth.sign_in_failed', actorLabel: 'nobody-here@kelvindex.test' });
    expect(audited).toBeGreaterThan(0);
  });

  it('refuses a missing field with 400 naming it', async () => {
    const res = await request(t.app).post('/api/v1/auth/login').send({ email: 'reader@kelvindex.test' }).expect(400);
    expect(res.body.details.fields.map((f: { field: string }) => f.field)).toContain('password');
  });

  it('rotates the refresh token on each use and revokes the family when an old one is replayed', async () => {
    const first = await login(t, 'reviewer@kelvindex.test', DEMO_PASSWORD).expect(200);
    const cookie1 = refreshCookie(first);
    const second = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', cookie1).expect(200);
    const cookie2 = refreshCookie(second);
    expect(cookie2).not.toBe(cookie1);
    expect(second.body.user.email).toBe('reviewer@kelvindex.test');

    const replay = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', cookie1).expect(401);
    expect(replay.body.message).toContain('used twice');
    // The successor was revoked with the family.
    await request(t.app).post('/api/v1/auth/refresh').set('Cookie', cookie2).expect(401);
  });

  it('revokes the refresh token on sign-out', async () => {
    const res = await login(t, 'editor@kelvindex.test', DEMO_PASSWORD).expect(200);
    const cookie = refreshCookie(res);
    await request(t.app).post('/api/v1/auth/logout').set('Cookie', cookie).expect(204);
    await request(t.app).post('/api/v1/auth/refresh').set('Cookie', cookie).expect(401);
  });

  it('refuses expired, tampered and foreign-signed access tokens', async () => {
    const good = await login(t, 'reader@kelvindex.test', DEMO_PASSWORD).expect(200);
    const token: string = good.body.accessToken;
    const [header, payload, signature] = token.split('.');
    const flipped = signature[5] === 'A' ? 'B' : 'A';
    const tampered = `${header}.${payload}.${signature.slice(0, 5)}${flipped}${signature.slice(6)}`;
    const res1 = await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${tampered}`).expect(401);
    expect(res1.body.message).toContain('not valid');

    const key = new TextEncoder().encode(t.config.jwtSecret);
    const expired = await new SignJWT({ email: 'reader@kelvindex.test', name: 'x', roles: ['reader'] })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(good.body.user.id)
      .setIssuer('kelvindex')
      .setAudience('kelvindex-api')
      .setIssuedAt(Math.floor(Date.now() / 1000) - 3600)
      .setExpirationTime(Math.floor(Date.now() / 1000) - 60)
      .sign(key);
    const res2 = await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${expired}`).expect(401);
    expect(res2.body.message).toContain('expired');

    const foreign = await new SignJWT({ roles: ['admin'] })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(good.body.user.id)
      .setIssuer('kelvindex')
      .setAudience('kelvindex-api')
      .setExpirationTime('5m')
      .sign(new TextEncoder().encode('some-other-secret'));
    await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${foreign}`).expect(401);
  });

  it('slows repeated failed sign-ins and then blocks them with 429', async () => {
    const email = 'brute-force-target@kelvindex.test';
    const timings: number[] = [];
    let blockedAt = -1;
    for (let attempt = 1; attempt <= 11; attempt++) {
      const started = Date.now();
      const res = await login(t, email, `guess-${attempt}`);
      timings.push(Date.now() - started);
      if (res.status === 429) {
        blockedAt = attempt;
        expect(res.body.message).toContain('Too many failed attempts');
        break;
      }
      expect(res.status).toBe(401);
    }
    expect(blockedAt).toBe(11);
    // Attempts 1–3 are free; attempt 6 waits at least 3 × 250 ms.
    expect(timings[5]).toBeGreaterThanOrEqual(700);
    expect(timings[5]).toBeGreaterThan(timings[0]);
  });
});

describe('invitation, reset and verification through the captured e-mails', () => {
  let t: TestApp;
  const invitee = `new-analyst-${Date.now()}@kelvindex.test`;
  beforeAll(async () => {
    t = await testApp();
  });

  it('lets an admin invite someone who signs up through the link, with the invited roles', async () => {
    const admin = await bearerFor(t.app, 'admin');
    await request(t.app).post('/api/v1/users/invitations').set('Authorization', admin).send({ email: invitee, roles: ['reader', 'steward'] }).expect(201);
    const mail = await waitForMail(invitee, /invited/);
    const token = tokenFromMail(mail);
    expect(mail.text).toContain('/accept-invitation?token=');

    const accepted = await request(t.app).post('/api/v1/auth/invitations/accept').send({ token, name: 'Invited Analyst', password: 'first-password-123' }).expect(201);
    expect(accepted.body.user.roles).toEqual(['reader', 'steward']);
    await login(t, invitee, 'first-password-123').expect(200);
    // Single use.
    const again = await request(t.app).post('/api/v1/auth/invitations/accept').send({ token, name: 'Someone', password: 'another-password-1' }).expect(422);
    expect(again.body.message).toContain('not valid');
  });

  it('resets a forgotten password through a single-use link without revealing whether an address exists', async () => {
    const known = await request(t.app).post('/api/v1/auth/password-reset/request').send({ email: invitee }).expect(202);
    const unknown = await request(t.app).post('/api/v1/auth/password-reset/request').send({ email: 'no-account@kelvindex.test' }).expect(202);
    expect(unknown.body).toEqual(known.body);

    const token = tokenFromMail(await waitForMail(invitee, /Reset/));
    await request(t.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'short' }).expect(400);
    await request(t.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'second-password-456' }).expect(204);
    await login(t, invitee, 'first-password-123').expect(401);
    await login(t, invitee, 'second-password-456').expect(200);
    await request(t.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'third-password-789' }).expect(422);
  });

  it('confirms an e-mail address through the verification link', async () => {
    const signedIn = await login(t, invitee, 'second-password-456').expect(200);
    await request(t.app).post('/api/v1/auth/verify-email/request').set('Authorization', `Bearer ${signedIn.body.accessToken}`).expect(202);
    const token = tokenFromMail(await waitForMail(invitee, /Confirm/));
    await request(t.app).post('/api/v1/auth/verify-email/confirm').send({ token }).expect(204);
    const admin = await bearerFor(t.app, 'admin');
    const users = await request(t.app).get('/api/v1/users').set('Authorization', admin).expect(200);
    expect(users.body.items.find((u: { email: string }) => u.email === invitee).emailVerified).toBeTrue();
  });

  it('changes a password only with the current one', async () => {
    const signedIn = await login(t, invitee, 'second-password-456').expect(200);
    const auth = `Bearer ${signedIn.body.accessToken}`;
    await request(t.app).post('/api/v1/auth/change-password').set('Authorization', auth).send({ currentPassword: 'wrong-one', newPassword: 'fourth-password-000' }).expect(422);
    await request(t.app).post('/api/v1/auth/change-password').set('Authorization', auth).send({ currentPassword: 'second-password-456', newPassword: 'fourth-password-000' }).expect(204);
    await login(t, invitee, 'fourth-password-000').expect(200);
  });

  it('lets an admin deactivate an account, which then cannot sign in or use its token', async () => {
    const signedIn = await login(t, invitee, 'fourth-password-000').expect(200);
    const admin = await bearerFor(t.app, 'admin');
    await request(t.app).post(`/api/v1/users/${signedIn.body.user.id}/deactivate`).set('Authorization', admin).expect(200);
    await login(t, invitee, 'fourth-password-000').expect(401);
    await request(t.app).get('/api/v1/auth/me').set('Authorization', `Bearer ${signedIn.body.accessToken}`).expect(401);
  });
});
