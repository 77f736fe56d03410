import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** Long random secrets (tokens, keys) are stored as SHA-256; a slow hash is for passwords only. */
export function sha256Hex(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}

export function randomSecret(bytes = 32): string {
  return randomBytes(bytes).toString('base64url');
}

export function sameHash(a: string, b: string): boolean {
  const left = Buffer.from(a, 'hex');
  const right = Buffer.from(b, 'hex');
  return left.length === right.length && timingSafeEqual(left, right);
}

const ALPHANUMERIC = 'ABCDEFGHJKLMNPQRSTUVWXYZabcdefghijkmnopqrstuvwxyz23456789';

export function randomAlphanumeric(length: number): string {
  const bytes = randomBytes(length);
  let out = '';
  for (const byte of bytes) out += ALPHANUMERIC[byte % ALPHANUMERIC.length];
  return out;
}
