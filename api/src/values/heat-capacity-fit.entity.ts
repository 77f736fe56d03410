import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { Source } from '../sources/source.entity';
import { SpeciesPhase } from '../species/species-phase.entity';
import type { FitRange } from './fit-ranges';
import type { FitForm, Method } from './value-vocabulary';

/**
 * One version of a heat-capacity function of a species phase, valid from `tMinK` to `tMaxK`.
 * Versioned and append-only like ThermoValue. `ranges` holds the coefficients (or tabulated
 * points) per temperature range; their forms and units are described in fit-ranges.ts and are
 * checked both there and by a database function.
 */
@Entity({ name: 'heat_capacity_fits' })
export class HeatCapacityFit {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'lineage_id', type: 'uuid' })
  lineageId: string;

  @Column({ name: 'version_no', type: 'integer' })
  versionNo: number;

  @Column({ name: 'supersedes_id', type: 'uuid', nullable: true })
  supersedesId: string | null;

  @Column({ name: 'species_phase_id', type: 'uuid' })
  speciesPhaseId: string;

  @ManyToOne(() => SpeciesPhase)
  @JoinColumn({ name: 'species_phase_id' })
  speciesPhase: Relation<SpeciesPhase>;

  @Column({ type: 'text' })
  form: FitForm;

  /** K */
  @Column({ name: 't_min_k', type: 'double precision' })
  tMinK: number;

  /** K */
  @Column({ name: 't_max_k', type: 'double precision' })
  tMaxK: number;

  @Column({ type: 'jsonb' })
  ranges: FitRange[];

  /** Pa; the standard pressure the function refers to */
  @Column({ name: 'pressure_pa', type: 'double precision', default: 100000 })
  pressurePa: number;

  @Column({ type: 'text' })
  method: Method;

  @Column({ name: 'level_of_theory', type: 'text', nullable: true })
  levelOfTheory: string | null;

  @Column({ name: 'source_id', type: 'uuid' })
  sourceId: string;

  @ManyToOne(() => Source)
  @JoinColumn({ name: 'source_id' })
  source: Relation<Source>;

  @Column({ name: 'source_locator', type: 'text', nullable: true })
  sourceLocator: string | null;

  @Column({ name: 'entered_by', type: 'uuid', nullable: true })
  enteredBy: string | null;

  @Column({ name: 'approved_by', type: 'uuid', nullable: true })
  approvedBy: string | null;

  @Column({ name: 'proposal_item_id', type: 'uuid', nullable: true })
  proposalItemId: string | null;

  @Column({ name: 'is_retired', type: 'boolean', default: false })
  isRetired: boolean;

  @Column({ name: 'retired_reason', type: 'text', nullable: true })
  retiredReason: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
