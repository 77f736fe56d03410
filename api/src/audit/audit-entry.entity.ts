import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One line of the audit trail: who did what to which record, when, from where. Append-only: the
 * database refuses UPDATE, DELETE and TRUNCATE. No foreign keys, so the trail outlives what it
 * mentions; `actorLabel` keeps the actor's e-mail as it was.
 */
@Entity({ name: 'audit_entries' })
export class AuditEntry {
  /** bigint identity, returned as a string by the driver */
  @PrimaryGeneratedColumn('identity', { type: 'bigint', generatedIdentity: 'ALWAYS' })
  id: string;

  @Column({ name: 'occurred_at', type: 'timestamptz', default: () => 'now()' })
  occurredAt: Date;

  @Column({ name: 'actor_user_id', type: 'uuid', nullable: true })
  actorUserId: string | null;

  @Column({ name: 'actor_api_key_id', type: 'uuid', nullable: true })
  actorApiKeyId: string | null;

  @Column({ name: 'actor_label', type: 'text', nullable: true })
  actorLabel: string | null;

  /** dotted lower-case verb, e.g. "auth.sign_in", "proposal.submit", "release.publish" */
  @Column({ type: 'text' })
  action: string;

  /** e.g. "proposal"; set together with entityId */
  @Column({ name: 'entity_type', type: 'text', nullable: true })
  entityType: string | null;

  @Column({ name: 'entity_id', type: 'text', nullable: true })
  entityId: string | null;

  @Column({ type: 'jsonb', default: () => `'{}'` })
  details: Record<string, unknown>;

  @Column({ name: 'ip_address', type: 'inet', nullable: true })
  ipAddress: string | null;

  @Column({ name: 'user_agent', type: 'text', nullable: true })
  userAgent: string | null;

  @Column({ name: 'request_id', type: 'text', nullable: true })
  requestId: string | null;
}
