import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor } from '../testing/sign-in';

interface Change {
  name: string;
  phase: string;
  kind: string;
  quantity: string;
  change: string;
  reason: string;
  before: { value?: number; uncertainty?: number | null; source: string; recommended: boolean } | null;
  after: { value?: number; uncertainty?: number | null; source: string; recommended: boolean; form?: string } | null;
}

// The demo's releases (seeds-demo/load-demo.ts): 2026.1 and 2026.2 published, 2027.1 in preparation.
// Other specs may publish releases of their own, so "latest" is not assumed to be 2026.2.
describe('releases API', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await testApp();
  });

  it('lists published releases newest first, and releases in preparation to editors only', async () => {
    const res = await request(t.app).get('/api/v1/releases').expect(200);
    const labels = res.body.items.map((r: { label: string }) => r.label);
    expect(labels).toContain('2026.1');
    expect(labels).toContain('2026.2');
    expect(labels.indexOf('2026.2')).toBeLessThan(labels.indexOf('2026.1'));
    expect(labels).not.toContain('2027.1');
    expect(res.body.items.filter((r: { latest: boolean }) => r.latest).length).toBe(1);
    const first = res.body.items.find((r: { label: string }) => r.label === '2026.1');
    expect(first).toEqual(jasmine.objectContaining({ status: 'published', publishedAt: '2026-01-26T10:00:00.000Z' }));
    expect(first.publishedBy).toEqual(jasmine.any(String));

    const editor = await request(t.app).get('/api/v1/releases').set('Authorization', await bearerFor(t.app, 'editor')).expect(200);
    expect(editor.body.items.find((r: { label: string }) => r.label === '2027.1')?.status).toBe('preparing');
    expect(editor.headers['cache-control']).toBe('private, no-store');
    const reader = await request(t.app).get('/api/v1/releases').set('Authorization', await bearerFor(t.app, 'reader')).expect(200);
    expect(reader.body.items.map((r: { label: string }) => r.label)).not.toContain('2027.1');
  });

  it('gives a release with its counts and its change log against the previous release', async () => {
    const res = await request(t.app).get('/api/v1/releases/2026.2').expect(200);
    expect(res.body).toEqual(jasmine.objectContaining({ label: '2026.2', status: 'published', comparedWith: '2026.1' }));
    expect(res.body.counts.species).toBeGreaterThan(10);
    // N2(g) from 2026.1, then H2O(g), H2, O2, CO, CO2, CH4 and NH3 (g) added in 2026.2.
    expect(res.body.counts.fits).toBe(8);
    const log: Change[] = res.body.changeLog;
    // Version 2 of ΔfH°(C, g) adds the uncertainty CODATA 1989 prints (± 0.45 kJ/mol).
    const carbon = log.find((c) => c.name === 'carbon' && c.phase === 'g' && c.quantity === 'dfH');
    expect(carbon).toEqual(jasmine.objectContaining({ change: 'revised', reason: 'new version' }));
    expect([carbon!.before!.uncertainty, carbon!.after!.uncertainty]).toEqual([null, 450]);
    // The duplicate NBS entry of ΔfH°(CO, g) is retired.
    const retired = log.filter((c) => c.change === 'retired');
    expect(retired.map((c) => [c.name, c.quantity, c.reason, c.before?.source, c.after])).toEqual([['carbon monoxide', 'dfH', 'retired', 'nbs-1982', null]]);
    // The TM-4513 polynomials of seven gases arrive; JANAF takes over as recommended source of CH4(g).
    const fits = log.filter((c) => c.kind === 'fit');
    expect(fits.map((c) => c.name).sort()).toEqual(['ammonia', 'carbon dioxide', 'carbon monoxide', 'hydrogen', 'methane', 'oxygen', 'water']);
    expect(fits.every((c) => c.change === 'added')).toBeTrue();
    const fit = fits.find((c) => c.name === 'water');
    expect(fit!.after).toEqual(jasmine.objectContaining({ form: 'nasa7', source: 'nasa-tm-4513', recommended: true }));
    const methane = log.filter((c) => c.name === 'methane' && c.quantity === 'dfH');
    expect(methane.map((c) => [c.change, c.reason])).toEqual(jasmine.arrayWithExactContents([['added', 'new lineage'], ['revised', 'no longer recommended']]));
    expect(res.body.summary).toEqual({
      added: log.filter((c) => c.change === 'added').length,
      revised: log.filter((c) => c.change === 'revised').length,
      retired: 1,
    });

    const first = await request(t.app).get('/api/v1/releases/2026.1').expect(200);
    expect(first.body.comparedWith).toBeNull();
    expect(first.body.changeLog.every((c: Change) => c.change === 'added')).toBeTrue();
  });

  it('gives the changes between any two releases', async () => {
    const detail = await request(t.app).get('/api/v1/releases/2026.2').expect(200);
    const diff = await request(t.app).get('/api/v1/releases/2026.1/diff/2026.2').expect(200);
    expect([diff.body.from, diff.body.to]).toEqual(['2026.1', '2026.2']);
    expect(diff.body.changeLog).toEqual(detail.body.changeLog);
    expect(diff.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    await request(t.app).get('/api/v1/releases/2026.1/diff/2026.2').set('If-None-Match', diff.headers.etag).expect(304);
    const backwards = await request(t.app).get('/api/v1/releases/2026.2/diff/2026.1').expect(200);
    expect(backwards.body.summary.retired).toBe(diff.body.summary.added);
    const same = await request(t.app).get('/api/v1/releases/2026.2/diff/2026.2').expect(200);
    expect(same.body.changeLog).toEqual([]);
  });

  it('shows a release in preparation to editors, uncached', async () => {
    await request(t.app).get('/api/v1/releases/2027.1').expect(404);
    await request(t.app).get('/api/v1/releases/2026.2/diff/2027.1').expect(404);
    const editor = await bearerFor(t.app, 'editor');
    const res = await request(t.app).get('/api/v1/releases/2027.1').set('Authorization', editor).expect(200);
    expect(res.body.status).toBe('preparing');
    expect(res.headers['cache-control']).toBe('private, no-store');
    const diff = await request(t.app).get('/api/v1/releases/2026.2/diff/2027.1').set('Authorization', editor).expect(200);
    expect(diff.headers['cache-control']).toBe('private, no-store');
  });

  it('refuses malformed and unknown labels', async () => {
    expect((await request(t.app).get('/api/v1/releases/latest').expect(400)).body.error).toBe('bad_request');
    await request(t.app).get('/api/v1/releases/2026.01').expect(400);
    await request(t.app).get('/api/v1/releases/1999.1').expect(404);
    await request(t.app).get('/api/v1/releases/2026.1/diff/x').expect(400);
    await request(t.app).get('/api/v1/releases/2026.1/diff/1999.1').expect(404);
  });
});
