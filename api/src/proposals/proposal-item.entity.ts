import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Proposal } from './proposal.entity';
import type { ProposalItemKind, StoredCheckResult } from './proposal-vocabulary';

/**
 * One change in a proposal. `payload` holds what the change adds (the workflow defines its shape
 * per kind); the id columns point at existing records it refers to (`target…`) and, once applied,
 * at what it created (`result…`). `checks` holds the automatic consistency checks' results from
 * the last submission. Value and fit items need a source (CHECK in the database).
 */
@Entity({ name: 'proposal_items' })
export class ProposalItem {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'proposal_id', type: 'uuid' })
  proposalId: string;

  @ManyToOne(() => Proposal, (proposal) => proposal.items, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'proposal_id' })
  proposal: Relation<Proposal>;

  /** 1-based order within the proposal; unique per proposal (deferrable, to reorder) */
  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'text' })
  kind: ProposalItemKind;

  @Column({ type: 'jsonb', default: () => `'{}'` })
  payload: Record<string, unknown>;

  @Column({ name: 'source_id', type: 'uuid', nullable: true })
  sourceId: string | null;

  @Column({ name: 'species_id', type: 'uuid', nullable: true })
  speciesId: string | null;

  @Column({ name: 'species_phase_id', type: 'uuid', nullable: true })
  speciesPhaseId: string | null;

  @Column({ name: 'target_value_id', type: 'uuid', nullable: true })
  targetValueId: string | null;

  @Column({ name: 'target_fit_id', type: 'uuid', nullable: true })
  targetFitId: string | null;

  @Column({ name: 'result_species_id', type: 'uuid', nullable: true })
  resultSpeciesId: string | null;

  @Column({ name: 'result_species_phase_id', type: 'uuid', nullable: true })
  resultSpeciesPhaseId: string | null;

  @Column({ name: 'result_value_id', type: 'uuid', nullable: true })
  resultValueId: string | null;

  @Column({ name: 'result_fit_id', type: 'uuid', nullable: true })
  resultFitId: string | null;

  @Column({ type: 'jsonb', nullable: true })
  checks: StoredCheckResult[] | null;

  @Column({ name: 'checks_ran_at', type: 'timestamptz', nullable: true })
  checksRanAt: Date | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
