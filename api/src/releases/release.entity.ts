import { Column, CreateDateColumn, Entity, OneToMany, PrimaryColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import { ReleaseMember } from './release-member.entity';

export const RELEASE_STATUSES = ['preparing', 'published'] as const;
export type ReleaseStatus = (typeof RELEASE_STATUSES)[number];

/**
 * A numbered release (`2027.1`: year, then a sequence number without leading zeros). Created in
 * preparation; publishing is an UPDATE to `published` that the database accepts only when every
 * species phase and quantity in it has exactly one recommended member. After that the database
 * refuses any change to the row or its membership.
 */
@Entity({ name: 'releases' })
export class Release {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ type: 'text' })
  label: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'text', default: 'preparing' })
  status: ReleaseStatus;

  /** generated change log (added, revised, retired, recommended changes), frozen with the release */
  @Column({ name: 'change_log', type: 'jsonb', nullable: true })
  changeLog: Record<string, unknown> | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @Column({ name: 'published_by', type: 'uuid', nullable: true })
  publishedBy: string | null;

  @Column({ name: 'published_at', type: 'timestamptz', nullable: true })
  publishedAt: Date | null;

  @OneToMany(() => ReleaseMember, (member) => member.release)
  members: Relation<ReleaseMember[]>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
