import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn, VersionColumn } from 'typeorm';

/**
 * A bibliographic source. `csl` is the record as CSL-JSON (one item object); `doi` is stored in
 * lower case (DOIs are case-insensitive), checked against `^10\.\d{4,9}/\S+$` and unique when
 * present; `shortKey` is the unique handle people cite in tables (e.g. "codata-1989").
 */
@Entity({ name: 'sources' })
export class Source {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'short_key', type: 'text' })
  shortKey: string;

  @Column({ type: 'text' })
  title: string;

  @Column({ type: 'integer', nullable: true })
  year: number | null;

  @Column({ type: 'text', nullable: true })
  doi: string | null;

  @Column({ type: 'jsonb', default: () => `'{}'` })
  csl: Record<string, unknown>;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
