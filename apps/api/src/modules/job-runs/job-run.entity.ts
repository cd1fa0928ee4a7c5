import type { JobState } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/**
 * A tenant-scoped mirror of one background job (pg-boss's own tables know no tenant), so a
 * page can follow its state and progress. Written by the job itself as it goes.
 */
@Entity({ name: 'job_runs' })
@Index('job_runs_organisation_id_created_at_idx', ['organisationId', 'createdAt'])
@Index('job_runs_test_id_idx', ['testId'])
export class JobRunEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  /** The pg-boss queue, e.g. 'analyse-test', 'import-readings'. */
  @Column('text')
  kind!: string;

  @Column('text', { default: 'queued' })
  state!: JobState;

  /** fraction 0–1 */
  @Column('double precision', { default: 0 })
  progress!: number;

  /** What a person reads: the step in progress, or why it failed. */
  @Column('text', { nullable: true })
  message!: string | null;

  @Column('uuid', { name: 'test_id', nullable: true })
  testId!: string | null;

  @Column('uuid', { name: 'upload_id', nullable: true })
  uploadId!: string | null;

  @Column('jsonb', { nullable: true })
  result!: Record<string, unknown> | null;

  @Column('text', { name: 'boss_job_id', nullable: true })
  bossJobId!: string | null;

  @Column('uuid', { name: 'created_by_id', nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
