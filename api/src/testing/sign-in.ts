import request from 'supertest';
import type { Express } from 'express';
import { DEMO_PASSWORD } from '../../../seeds-demo/demo-accounts';

export type DemoRole = 'reader' | 'steward' | 'reviewer' | 'reviewer2' | 'editor' | 'admin';

const cache = new Map<string, string>();

/** Signs a demo account in once per spec process and returns `Authorization` header value. */
export async function bearerFor(app: Express, who: DemoRole): Promise<string> {
  const cached = cache.get(who);
  if (cached) return cached;
  const res = await request(app).post('/api/v1/auth/login').send({ email: `${who}@kelvindex.test`, password: DEMO_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${who} failed: ${res.status} ${JSON.stringify(res.body)}`);
  const header = `Bearer ${res.body.accessToken}`;
  cache.set(who, header);
  return header;
}

/** The refresh cookie (`kx_refresh=…`) from a sign-in or refresh answer. */
export function refreshCookie(res: request.Response): string {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('kx_refresh='));
  if (!cookie) throw new Error('no refresh cookie in the answer');
  return cookie.split(';')[0];
}
