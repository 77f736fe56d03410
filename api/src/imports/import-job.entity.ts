import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

export const IMPORT_JOB_STATUSES = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type ImportJobStatus = (typeof IMPORT_JOB_STATUSES)[number];

/** A problem found in an import file, by line. */
export interface ImportProblem {
  line: number;
  field?: string;
  message: string;
}

/**
 * A bulk import of values from a CSV or XML file: its progress while it runs, the problems it
 * found (with line numbers) and, for a real (not dry) run, the draft proposal it created.
 */
@Entity({ name: 'import_jobs' })
export class ImportJob {
  @PrimaryColumn({ type: 'uuid', default: () => 'gen_random_uuid()' })
  id: string;

  @Column({ name: 'created_by', type: 'uuid' })
  createdBy: string;

  @Column({ name: 'file_name', type: 'text' })
  fileName: string;

  @Column({ type: 'text' })
  format: 'csv' | 'xml';

  @Column({ name: 'dry_run', type: 'boolean', default: false })
  dryRun: boolean;

  @Column({ type: 'text', default: 'queued' })
  status: ImportJobStatus;

  @Column({ name: 'total_rows', type: 'integer', nullable: true })
  totalRows: number | null;

  @Column({ name: 'processed_rows', type: 'integer', default: 0 })
  processedRows: number;

  @Column({ name: 'error_count', type: 'integer', default: 0 })
  errorCount: number;

  @Column({ type: 'jsonb', default: () => `'[]'` })
  errors: ImportProblem[];

  /** where the uploaded file is kept in the object store */
  @Column({ name: 'object_key', type: 'text', nullable: true })
  objectKey: string | null;

  @Column({ name: 'proposal_id', type: 'uuid', nullable: true })
  proposalId: string | null;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;

  @Column({ name: 'started_at', type: 'timestamptz', nullable: true })
  startedAt: Date | null;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt: Date | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
