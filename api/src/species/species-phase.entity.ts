import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import type { PhaseCode } from './phase-code';
import { Species } from './species.entity';

/**
 * A species in one phase (IUPAC abbreviation plus an optional polymorph, e.g. cr, graphite).
 * Each carries its own data: a species in two phases is two rows, never one.
 * Unique per (species, phase, polymorph).
 */
@Entity({ name: 'species_phases' })
export class SpeciesPhase {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'species_id', type: 'uuid' })
  speciesId: string;

  @ManyToOne(() => Species, (species) => species.phases)
  @JoinColumn({ name: 'species_id' })
  species: Relation<Species>;

  @Column({ type: 'text' })
  phase: PhaseCode;

  /** e.g. "graphite", "rhombic"; only for cr, am and l */
  @Column({ type: 'text', nullable: true })
  polymorph: string | null;

  /** the reference state of its element at 298.15 K and 1 bar (ΔfH° = ΔfG° = 0 there) */
  @Column({ name: 'is_reference_state', type: 'boolean', default: false })
  isReferenceState: boolean;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
