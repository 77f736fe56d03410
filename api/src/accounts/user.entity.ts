import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { Role } from '../auth/principal';

/**
 * A person who signs in. Roles are a text[] checked against the known roles in the database;
 * a deactivated user keeps their row (the audit trail and the data they entered point at it).
 */
@Entity({ name: 'users' })
export class User {
  // uuid keys come from the database's gen_random_uuid() (PostgreSQL 13+ core, no extension).
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  /** lower-case; unique */
  @Column({ type: 'text' })
  email: string;

  @Column({ name: 'display_name', type: 'text' })
  displayName: string;

  /** bcrypt hash; null until an invited user sets a password */
  @Column({ name: 'password_hash', type: 'text', nullable: true, select: false })
  passwordHash: string | null;

  @Column({ type: 'text', array: true, default: () => `'{reader}'` })
  roles: Role[];

  @Column({ name: 'email_verified_at', type: 'timestamptz', nullable: true })
  emailVerifiedAt: Date | null;

  @Column({ name: 'deactivated_at', type: 'timestamptz', nullable: true })
  deactivatedAt: Date | null;

  @Column({ name: 'last_sign_in_at', type: 'timestamptz', nullable: true })
  lastSignInAt: Date | null;

  @Column({ name: 'password_changed_at', type: 'timestamptz', nullable: true })
  passwordChangedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  /** optimistic locking; a trigger also bumps it on every UPDATE */
  @VersionColumn()
  version: number;
}
