import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ProposalItem } from '../proposals/proposal-item.entity';
import { Source } from './source.entity';

const bigintAsNumber = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};

/**
 * A file backing a source or a proposal item (a paper, a calorimetry data file). The bytes live in
 * the object store under `objectKey`; the row keeps what identifies them: name, media type, size
 * and SHA-256 (64 lower-case hex digits).
 */
@Entity({ name: 'evidence_files' })
export class EvidenceFile {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'source_id', type: 'uuid', nullable: true })
  sourceId: string | null;

  @ManyToOne(() => Source)
  @JoinColumn({ name: 'source_id' })
  source: Relation<Source> | null;

  @Column({ name: 'proposal_item_id', type: 'uuid', nullable: true })
  proposalItemId: string | null;

  @ManyToOne(() => ProposalItem)
  @JoinColumn({ name: 'proposal_item_id' })
  proposalItem: Relation<ProposalItem> | null;

  @Column({ name: 'file_name', type: 'text' })
  fileName: string;

  @Column({ name: 'media_type', type: 'text' })
  mediaType: string;

  /** bytes */
  @Column({ name: 'size_bytes', type: 'bigint', transformer: bigintAsNumber })
  sizeBytes: number;

  @Column({ type: 'text' })
  sha256: string;

  @Column({ name: 'object_key', type: 'text' })
  objectKey: string;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  @Column({ name: 'uploaded_by', type: 'uuid', nullable: true })
  uploadedBy: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
