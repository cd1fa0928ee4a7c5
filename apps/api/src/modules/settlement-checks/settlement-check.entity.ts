import type { CheckOptions, FootingRow } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { GroundModelEntity } from '../ground-models/ground-model.entity.js';
import { ProjectEntity } from '../projects/project.entity.js';

/**
 * A settlement check: the designer's editable draft (ground model, footing schedule, options).
 * Every run freezes the draft into an immutable revision.
 */
@Entity({ name: 'settlement_checks' })
@Index('settlement_checks_organisation_id_idx', ['organisationId'])
@Index('settlement_checks_project_id_idx', ['projectId'])
export class SettlementCheckEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'settlement_checks_project_id_fkey' })
  project!: Relation<ProjectEntity>;

  @Column('text')
  name!: string;

  @Column('uuid', { name: 'ground_model_id' })
  groundModelId!: string;

  @ManyToOne(() => GroundModelEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ground_model_id', foreignKeyConstraintName: 'settlement_checks_ground_model_id_fkey' })
  groundModel!: Relation<GroundModelEntity>;

  @Column('jsonb', { default: () => "'[]'" })
  footings!: FootingRow[];

  @Column('jsonb')
  options!: CheckOptions;

  /** The newest revision's number; null before the first run. */
  @Column('integer', { name: 'current_revision', nullable: true })
  currentRevision!: number | null;

  /** The job_runs row of a run queued for the worker (large checks), until it ends. */
  @Column('uuid', { name: 'pending_job_id', nullable: true })
  pendingJobId!: string | null;

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
