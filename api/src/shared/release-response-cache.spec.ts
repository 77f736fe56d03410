import express from 'express';
import request from 'supertest';
import { ReleaseResponseCache } from './release-response-cache';

/** A tiny app whose one route answers through the cache and counts how often it computed. */
function appWith(cache: ReleaseResponseCache, release: { id: string; status: string; explicit: boolean }) {
  const computed: string[] = [];
  const app = express();
  app.get('/answer', async (req, res, next) => {
    try {
      await cache.sendJson(req, res, release, async () => {
        computed.push(String(req.query.x));
        if (req.query.x === 'fail') throw new Error('refused');
        return { x: req.query.x, n: computed.length };
      });
    } catch (error) {
      next(error);
    }
  });
  app.use((_error: unknown, _req: express.Request, res: express.Response, _next: express.NextFunction) => {
    res.status(422).json({ error: 'refused' });
  });
  return { app, computed };
}

const published = { id: 'r1', status: 'published', explicit: true };

describe('ReleaseResponseCache', () => {
  it('computes an answer from a published release once and sends the same bytes and ETag again', async () => {
    const { app, computed } = appWith(new ReleaseResponseCache(1024 * 1024, true), published);
    const first = await request(app).get('/answer?x=a').expect(200);
    const second = await request(app).get('/answer?x=a').expect(200);
    expect(computed).toEqual(['a']);
    expect(second.text).toBe(first.text);
    expect(second.headers.etag).toBe(first.headers.etag);
    expect(first.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(first.headers['content-type']).toMatch(/^application\/json/);
  });

  it('keeps answers apart by URL', async () => {
    const { app, computed } = appWith(new ReleaseResponseCache(1024 * 1024, true), published);
    await request(app).get('/answer?x=a').expect(200);
    const b = await request(app).get('/answer?x=b').expect(200);
    expect(computed).toEqual(['a', 'b']);
    expect(b.body.x).toBe('b');
  });

  it('answers 304 to the ETag it gave, from memory', async () => {
    const { app, computed } = appWith(new ReleaseResponseCache(1024 * 1024, false), published);
    const first = await request(app).get('/answer?x=a').expect(200);
    expect(first.headers['cache-control']).toBe('private, max-age=31536000, immutable');
    await request(app).get('/answer?x=a').set('If-None-Match', first.headers.etag).expect(304);
    expect(computed).toEqual(['a']);
  });

  it('never keeps an answer from a release in preparation', async () => {
    const { app, computed } = appWith(new ReleaseResponseCache(1024 * 1024, true), { id: 'r2', status: 'preparing', explicit: true });
    const first = await request(app).get('/answer?x=a').expect(200);
    await request(app).get('/answer?x=a').expect(200);
    expect(computed).toEqual(['a', 'a']);
    expect(first.headers['cache-control']).toBe('private, no-store');
  });

  it('keeps nothing and sends no cache headers when the computation fails', async () => {
    const { app, computed } = appWith(new ReleaseResponseCache(1024 * 1024, true), published);
    const refused = await request(app).get('/answer?x=fail').expect(422);
    expect(refused.headers['cache-control']).toBeUndefined();
    await request(app).get('/answer?x=fail').expect(422);
    expect(computed).toEqual(['fail', 'fail']);
  });

  it('computes every time when turned off (size 0)', async () => {
    const cache = new ReleaseResponseCache(0, true);
    expect(cache.enabled).toBeFalse();
    const { app, computed } = appWith(cache, published);
    await request(app).get('/answer?x=a').expect(200);
    await request(app).get('/answer?x=a').expect(200);
    expect(computed).toEqual(['a', 'a']);
  });

  it('forgets the least recently used answers beyond its size', async () => {
    // Each answer takes about 2 × 20 bytes of body plus its key; 400 bytes hold a few, not all ten.
    const { app, computed } = appWith(new ReleaseResponseCache(400, true), published);
    for (let i = 0; i < 10; i += 1) await request(app).get(`/answer?x=${i}`).expect(200);
    await request(app).get('/answer?x=9').expect(200);
    await request(app).get('/answer?x=0').expect(200);
    expect(computed).toEqual(['0', '1', '2', '3', '4', '5', '6', '7', '8', '9', '0']);
  });
});
