import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { HeatCapacityFit } from '../values/heat-capacity-fit.entity';
import { ThermoValue } from '../values/thermo-value.entity';
import type { Quantity, TransitionKind } from '../values/value-vocabulary';
import { Release } from './release.entity';

/**
 * One value version or fit version held by a release. A release lists everything it holds (a
 * complete snapshot), at most one version per lineage. `speciesPhaseId`, `quantity`,
 * `transitionKind` and `lineageId` are copied from the value or fit by a trigger (fits count as
 * quantity Cp, kind "fit"); at most one member per (release, species phase, kind, quantity,
 * transition) is recommended, and publishing requires exactly one.
 */
@Entity({ name: 'release_members' })
export class ReleaseMember {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'release_id', type: 'uuid' })
  releaseId: string;

  @ManyToOne(() => Release, (release) => release.members, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'release_id' })
  release: Relation<Release>;

  @Column({ name: 'member_kind', type: 'text' })
  memberKind: 'value' | 'fit';

  @Column({ name: 'value_id', type: 'uuid', nullable: true })
  valueId: string | null;

  @ManyToOne(() => ThermoValue)
  @JoinColumn({ name: 'value_id' })
  value: Relation<ThermoValue> | null;

  @Column({ name: 'fit_id', type: 'uuid', nullable: true })
  fitId: string | null;

  @ManyToOne(() => HeatCapacityFit)
  @JoinColumn({ name: 'fit_id' })
  fit: Relation<HeatCapacityFit> | null;

  @Column({ name: 'lineage_id', type: 'uuid' })
  lineageId: string;

  @Column({ name: 'species_phase_id', type: 'uuid' })
  speciesPhaseId: string;

  @Column({ type: 'text' })
  quantity: Quantity;

  @Column({ name: 'transition_kind', type: 'text', nullable: true })
  transitionKind: TransitionKind | null;

  @Column({ name: 'is_recommended', type: 'boolean', default: false })
  isRecommended: boolean;

  /** the proposal that brought this version into the release; null when carried over */
  @Column({ name: 'proposal_id', type: 'uuid', nullable: true })
  proposalId: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
