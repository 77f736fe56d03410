import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import { User } from '../accounts/user.entity';
import { SavedReactionTerm } from './saved-reaction-term.entity';

/**
 * A reaction an engineer keeps, as typed (`equation`) and with the temperatures / K to evaluate
 * it at; optionally pinned to a release. Its terms (species phases with stoichiometric numbers)
 * let a revision find the saved reactions it affects.
 */
@Entity({ name: 'saved_reactions' })
export class SavedReaction {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ type: 'text' })
  name: string;

  /** e.g. "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)" */
  @Column({ type: 'text' })
  equation: string;

  /** K, each > 0 */
  @Column({ name: 'temperatures_k', type: 'double precision', array: true, default: () => `'{298.15}'` })
  temperaturesK: number[];

  @Column({ name: 'pinned_release_id', type: 'uuid', nullable: true })
  pinnedReleaseId: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @OneToMany(() => SavedReactionTerm, (term) => term.savedReaction)
  terms: Relation<SavedReactionTerm[]>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
