import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import { User } from '../accounts/user.entity';
import { Release } from '../releases/release.entity';
import { ProposalItem } from './proposal-item.entity';
import type { ProposalState } from './proposal-vocabulary';

/**
 * A steward's set of changes, reviewed as one. `version` is the optimistic lock for state
 * transitions (a trigger bumps it on every UPDATE): `UPDATE … WHERE id = $1 AND version = $2`
 * matching nothing means someone else moved the proposal first.
 */
@Entity({ name: 'proposals' })
export class Proposal {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ type: 'text' })
  title: string;

  @Column({ type: 'text', default: '' })
  summary: string;

  @Column({ type: 'text', default: 'draft' })
  state: ProposalState;

  @Column({ name: 'author_id', type: 'uuid' })
  authorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'author_id' })
  author: Relation<User>;

  /** the release it is assembled into (set when approved work is added to a release) */
  @Column({ name: 'release_id', type: 'uuid', nullable: true })
  releaseId: string | null;

  @ManyToOne(() => Release)
  @JoinColumn({ name: 'release_id' })
  release: Relation<Release> | null;

  @Column({ name: 'submitted_at', type: 'timestamptz', nullable: true })
  submittedAt: Date | null;

  /** when it was approved, rejected or withdrawn */
  @Column({ name: 'decided_at', type: 'timestamptz', nullable: true })
  decidedAt: Date | null;

  @OneToMany(() => ProposalItem, (item) => item.proposal)
  items: Relation<ProposalItem[]>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
