import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { SpeciesPhase } from '../species/species-phase.entity';
import { SavedReaction } from './saved-reaction.entity';

/** A species phase in a saved reaction with its stoichiometric number ν (negative for reactants). */
@Entity({ name: 'saved_reaction_terms' })
export class SavedReactionTerm {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'saved_reaction_id', type: 'uuid' })
  savedReactionId: string;

  @ManyToOne(() => SavedReaction, (reaction) => reaction.terms, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'saved_reaction_id' })
  savedReaction: Relation<SavedReaction>;

  @Column({ name: 'species_phase_id', type: 'uuid' })
  speciesPhaseId: string;

  @ManyToOne(() => SpeciesPhase, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'species_phase_id' })
  speciesPhase: Relation<SpeciesPhase>;

  @Column({ type: 'double precision' })
  coefficient: number;
}
