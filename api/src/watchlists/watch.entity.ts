import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { User } from '../accounts/user.entity';
import { Species } from '../species/species.entity';

/** A user watches a species (all its phases) and is told when a release changes its data. */
@Entity({ name: 'watches' })
export class Watch {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ name: 'species_id', type: 'uuid' })
  speciesId: string;

  @ManyToOne(() => Species, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'species_id' })
  species: Relation<Species>;

  @Column({ name: 'notify_by_email', type: 'boolean', default: true })
  notifyByEmail: boolean;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
