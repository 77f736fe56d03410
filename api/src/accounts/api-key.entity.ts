import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { User } from './user.entity';

/**
 * An API key for a downstream tool. The key is `<prefix>.<secret>` (or similar): the prefix is
 * stored in clear to find the row, the secret only as its SHA-256 (64 hex digits).
 */
@Entity({ name: 'api_keys' })
export class ApiKey {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ type: 'text' })
  name: string;

  /** public, unique, 6–32 of [A-Za-z0-9_] */
  @Column({ type: 'text' })
  prefix: string;

  @Column({ name: 'secret_hash', type: 'text', select: false })
  secretHash: string;

  /** read-only unless created with the write scope */
  @Column({ type: 'text', default: 'read' })
  scope: 'read' | 'write';

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;

  @Column({ name: 'expires_at', type: 'timestamptz', nullable: true })
  expiresAt: Date | null;

  @Column({ name: 'last_used_at', type: 'timestamptz', nullable: true })
  lastUsedAt: Date | null;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;
}
