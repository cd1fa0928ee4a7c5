import type { CompliancePoint, Picks, TestStatus } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { SampleEntity } from '../samples/sample.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** One oedometer (incremental loading) test on a specimen cut from a sample. */
@Entity({ name: 'consolidation_tests' })
@Index('consolidation_tests_organisation_id_status_idx', ['organisationId', 'status'])
@Index('consolidation_tests_sample_id_idx', ['sampleId'])
@Index('consolidation_tests_organisation_reference_key', ['organisationId', 'reference'], { unique: true })
export class ConsolidationTestEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'sample_id' })
  sampleId!: string;

  @ManyToOne(() => SampleEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'sample_id', foreignKeyConstraintName: 'consolidation_tests_sample_id_fkey' })
  sample!: Relation<SampleEntity>;

  @Column('text')
  reference!: string;

  /** One of TEST_STATUSES; moves are checked by test-status-machine.ts. */
  @Column('text', { default: 'draft' })
  status!: TestStatus;

  @Column('uuid', { name: 'technician_id' })
  technicianId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'technician_id', foreignKeyConstraintName: 'consolidation_tests_technician_id_fkey' })
  technician!: Relation<UserEntity>;

  @Column('double precision', { name: 'initial_height_mm', nullable: true })
  initialHeightMm!: number | null;

  @Column('double precision', { name: 'diameter_mm', nullable: true })
  diameterMm!: number | null;

  @Column('double precision', { name: 'specific_gravity', nullable: true })
  specificGravity!: number | null;

  @Column('double precision', { name: 'dry_mass_g', nullable: true })
  dryMassG!: number | null;

  /** Fraction, not percent. */
  @Column('double precision', { name: 'initial_water_content', nullable: true })
  initialWaterContent!: number | null;

  @Column('double precision', { name: 'wet_mass_g', nullable: true })
  wetMassG!: number | null;

  @Column('double precision', { name: 'final_water_content', nullable: true })
  finalWaterContent!: number | null;

  /** 'double' | 'single' */
  @Column('text', { default: 'double' })
  drainage!: 'double' | 'single';

  @Column('text', { name: 'apparatus_name', default: '' })
  apparatusName!: string;

  /** Apparatus calibration: stress → deflection of the loading frame with a steel dummy. */
  @Column('jsonb', { default: () => "'[]'" })
  compliance!: CompliancePoint[];

  @Column('date', { name: 'started_on', nullable: true })
  startedOn!: string | null;

  @Column('date', { name: 'finished_on', nullable: true })
  finishedOn!: string | null;

  /** The overrides in force; the next analysis uses them. */
  @Column('jsonb', { default: () => "'{}'" })
  picks!: Picks;

  @Column('text', { name: 'pick_reason', nullable: true })
  pickReason!: string | null;

  /** The import whose readings are current (set by markReadingsUploaded). */
  @Column('uuid', { name: 'latest_upload_id', nullable: true })
  latestUploadId!: string | null;

  /** The analysis of the current readings and picks; null when new readings made it stale. */
  @Column('uuid', { name: 'latest_analysis_id', nullable: true })
  latestAnalysisId!: string | null;

  @Column('timestamptz', { name: 'submitted_at', nullable: true })
  submittedAt!: Date | null;

  @Column('uuid', { name: 'submitted_by_id', nullable: true })
  submittedById!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
