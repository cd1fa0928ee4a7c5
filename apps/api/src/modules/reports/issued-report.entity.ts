import type { ReportKind, ReportState } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One report the laboratory issues about one immutable subject (for a test report: an
 * approved soil record version). Generated once by a job; when it is ready its stored file
 * and SHA-256 never change (a database trigger refuses it), so every download is the same file.
 */
@Entity({ name: 'issued_reports' })
@Index('issued_reports_organisation_id_idx', ['organisationId'])
@Index('issued_reports_kind_subject_id_key', ['kind', 'subjectId'], { unique: true })
@Index('issued_reports_test_id_idx', ['testId'])
export class IssuedReportEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('text')
  kind!: ReportKind;

  /** What the report is about: for 'test-report' the soil_record_versions id. */
  @Column('uuid', { name: 'subject_id' })
  subjectId!: string;

  /** The test behind the subject, when there is one (lists of failed jobs per test). */
  @Column('uuid', { name: 'test_id', nullable: true })
  testId!: string | null;

  @Column('text', { default: 'queued' })
  state!: ReportState;

  /** Why the last generation failed, in words a lab manager can act on. */
  @Column('text', { nullable: true })
  message!: string | null;

  /** The job_runs row of the newest generation attempt. */
  @Column('uuid', { name: 'job_run_id', nullable: true })
  jobRunId!: string | null;

  @Column('text', { name: 'object_key', nullable: true })
  objectKey!: string | null;

  @Column('text', { name: 'file_name', nullable: true })
  fileName!: string | null;

  /** Hex SHA-256 of the stored PDF. */
  @Column('text', { nullable: true })
  sha256!: string | null;

  @Column('integer', { name: 'byte_size', nullable: true })
  byteSize!: number | null;

  @Column('timestamptz', { name: 'generated_at', nullable: true })
  generatedAt!: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
