import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { User } from '../accounts/user.entity';
import { Proposal } from './proposal.entity';
import type { ReviewDecision } from './proposal-vocabulary';

/**
 * A reviewer's decision on a proposal. The database refuses a review by the proposal's author
 * (four-eyes rule). `checkOverrideJustification` records why a failed check did not block an
 * approval; `proposalVersion` is the proposal version the reviewer saw.
 */
@Entity({ name: 'proposal_reviews' })
export class Review {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'proposal_id', type: 'uuid' })
  proposalId: string;

  @ManyToOne(() => Proposal)
  @JoinColumn({ name: 'proposal_id' })
  proposal: Relation<Proposal>;

  @Column({ name: 'reviewer_id', type: 'uuid' })
  reviewerId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'reviewer_id' })
  reviewer: Relation<User>;

  @Column({ type: 'text' })
  decision: ReviewDecision;

  @Column({ type: 'text', default: '' })
  comment: string;

  @Column({ name: 'check_override_justification', type: 'text', nullable: true })
  checkOverrideJustification: string | null;

  @Column({ name: 'proposal_version', type: 'integer', nullable: true })
  proposalVersion: number | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
