import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { RefreshToken } from '../accounts/refresh-token.entity';
import { randomSecret, sha256Hex } from './secrets';

export type RefreshOutcome =
  | { kind: 'rotated'; userId: string; secret: string }
  | { kind: 'reused'; userId: string; familyId: string }
  | { kind: 'invalid' };

export async function issueRefreshToken(
  manager: EntityManager,
  userId: string,
  lifetimeDays: number,
  meta: { familyId?: string; userAgent?: string | null; ip?: string | null },
): Promise<{ id: string; secret: string }> {
  const secret = randomSecret();
  const id = randomUUID();
  await manager.insert(RefreshToken, {
    id,
    userId,
    familyId: meta.familyId ?? randomUUID(),
    tokenHash: sha256Hex(secret),
    expiresAt: new Date(Date.now() + lifetimeDays * 86_400_000),
    userAgent: meta.userAgent?.slice(0, 500) ?? null,
    ipAddress: meta.ip ?? null,
  });
  return { id, secret };
}

/**
 * Rotates a refresh token: the presented one is spent and a successor in the same family issued.
 * Presenting an already spent token means it was copied: the whole family is revoked.
 */
export async function rotateRefreshToken(
  manager: EntityManager,
  secret: string,
  lifetimeDays: number,
  meta: { userAgent?: string | null; ip?: string | null },
): Promise<RefreshOutcome> {
  const token = await manager.getRepository(RefreshToken).findOne({ where: { tokenHash: sha256Hex(secret) }, lock: { mode: 'pessimistic_write' } });
  if (!token || token.revokedAt || token.expiresAt < new Date()) return { kind: 'invalid' };
  if (token.usedAt) {
    await revokeFamily(manager, token.familyId, 'reuse of a rotated refresh token');
    return { kind: 'reused', userId: token.userId, familyId: token.familyId };
  }
  const next = await issueRefreshToken(manager, token.userId, lifetimeDays, { ...meta, familyId: token.familyId });
  await manager.update(RefreshToken, { id: token.id }, { usedAt: new Date(), replacedById: next.id });
  return { kind: 'rotated', userId: token.userId, secret: next.secret };
}

export async function revokeFamily(manager: EntityManager, familyId: string, reason: string): Promise<void> {
  await manager.query(`UPDATE refresh_tokens SET revoked_at = now(), revoked_reason = $2 WHERE family_id = $1 AND revoked_at IS NULL`, [familyId, reason]);
}

export async function revokeBySecret(manager: EntityManager, secret: string, reason: string): Promise<void> {
  const token = await manager.getRepository(RefreshToken).findOneBy({ tokenHash: sha256Hex(secret) });
  if (token) await revokeFamily(manager, token.familyId, reason);
}

export async function revokeAllForUser(manager: EntityManager, userId: string, reason: string): Promise<void> {
  await manager.query(`UPDATE refresh_tokens SET revoked_at = now(), revoked_reason = $2 WHERE user_id = $1 AND revoked_at IS NULL`, [userId, reason]);
}
