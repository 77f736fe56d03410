import type { EntityManager } from 'typeorm';
import { IsNull, MoreThan } from 'typeorm';
import { OneTimeToken, type OneTimeTokenPurpose } from '../accounts/one-time-token.entity';
import type { Role } from './principal';
import { randomSecret, sha256Hex } from './secrets';

export const TOKEN_LIFETIME_HOURS: Record<OneTimeTokenPurpose, number> = {
  invitation: 7 * 24,
  password_reset: 1,
  email_verification: 48,
};

/** Issues a single-use link token; only its hash is stored. Returns the secret for the e-mail. */
export async function issueOneTimeToken(
  manager: EntityManager,
  fields: { purpose: OneTimeTokenPurpose; email: string; userId?: string | null; roles?: Role[]; createdBy?: string | null },
): Promise<string> {
  const secret = randomSecret();
  await manager.insert(OneTimeToken, {
    purpose: fields.purpose,
    email: fields.email,
    userId: fields.userId ?? null,
    roles: fields.roles ?? [],
    createdBy: fields.createdBy ?? null,
    tokenHash: sha256Hex(secret),
    expiresAt: new Date(Date.now() + TOKEN_LIFETIME_HOURS[fields.purpose] * 3600_000),
  });
  return secret;
}

/**
 * Spends a token: it must exist for this purpose, be unused and unexpired. The row is locked so
 * that two requests with the same link cannot both succeed.
 */
export async function spendOneTimeToken(manager: EntityManager, purpose: OneTimeTokenPurpose, secret: string): Promise<OneTimeToken | null> {
  const token = await manager.getRepository(OneTimeToken).findOne({
    where: { tokenHash: sha256Hex(secret), purpose, usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
    lock: { mode: 'pessimistic_write' },
  });
  if (!token) return null;
  await manager.update(OneTimeToken, { id: token.id }, { usedAt: new Date() });
  return token;
}
