import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { ProjectEntity } from '../projects/project.entity.js';

/** A project's ground model: a head row naming it; what it holds is in its immutable revisions. */
@Entity({ name: 'ground_models' })
@Index('ground_models_organisation_id_idx', ['organisationId'])
@Index('ground_models_project_id_idx', ['projectId'])
export class GroundModelEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'ground_models_project_id_fkey' })
  project!: Relation<ProjectEntity>;

  /** The name of the newest revision (a revision may rename the model). */
  @Column('text')
  name!: string;

  @Column('integer', { name: 'current_revision' })
  currentRevision!: number;

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
