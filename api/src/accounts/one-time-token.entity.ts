import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { Role } from '../auth/principal';

export const ONE_TIME_TOKEN_PURPOSES = ['invitation', 'password_reset', 'email_verification'] as const;
export type OneTimeTokenPurpose = (typeof ONE_TIME_TOKEN_PURPOSES)[number];

/**
 * A single-use, expiring link token for an invitation, a password reset or an e-mail
 * verification, stored as the SHA-256 of the secret. `usedAt` set = spent.
 */
@Entity({ name: 'one_time_tokens' })
export class OneTimeToken {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ type: 'text' })
  purpose: OneTimeTokenPurpose;

  /** lower-case address the link was sent to */
  @Column({ type: 'text' })
  email: string;

  /** required except for invitations (the user may not exist yet) */
  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @Column({ name: 'token_hash', type: 'text' })
  tokenHash: string;

  /** roles an invitation grants */
  @Column({ type: 'text', array: true, default: () => `'{}'` })
  roles: Role[];

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;
}
