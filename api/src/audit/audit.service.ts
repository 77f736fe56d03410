import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import { AuditEntry } from './audit-entry.entity';
import type { Principal } from '../auth/principal';

export interface AuditEvent {
  action: string;
  actor?: Pick<Principal, 'userId' | 'email' | 'apiKeyId'> | null;
  /** For events before anyone is signed in (a failed sign-in): the address that was tried. */
  actorLabel?: string;
  entityType?: string;
  entityId?: string;
  details?: Record<string, unknown>;
}

/**
 * The same line as an INSERT statement, for a connection outside TypeORM (the bulk import's
 * writer thread, which sends it inside its own transaction).
 */
export function auditInsert(event: AuditEvent, req?: Request): { text: string; values: unknown[] } {
  return {
    text: `INSERT INTO audit_entries (action, actor_user_id, actor_api_key_id, actor_label, entity_type, entity_id, details, ip_address, user_agent)
           VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)`,
    values: [
      event.action, event.actor?.userId ?? null, event.actor?.apiKeyId ?? null, event.actor?.email ?? event.actorLabel ?? null,
      event.entityType ?? null, event.entityId ?? null, JSON.stringify(event.details ?? {}), req?.ip ?? null, req?.get('user-agent')?.slice(0, 500) ?? null,
    ],
  };
}

/** Appends one line to the audit trail, inside the caller's transaction when one is given. */
export async function recordAudit(manager: EntityManager, event: AuditEvent, req?: Request): Promise<void> {
  await manager.insert(AuditEntry, {
    action: event.action,
    actorUserId: event.actor?.userId ?? null,
    actorApiKeyId: event.actor?.apiKeyId ?? null,
    actorLabel: event.actor?.email ?? event.actorLabel ?? null,
    entityType: event.entityType ?? null,
    entityId: event.entityId ?? null,
    details: (event.details ?? {}) as never,
    ipAddress: req?.ip ?? null,
    userAgent: req?.get('user-agent')?.slice(0, 500) ?? null,
  });
}
