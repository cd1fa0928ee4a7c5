import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { ProjectEntity } from '../projects/project.entity.js';

/** A characteristic set of one stratum: a head row; its content is in immutable revisions. */
@Entity({ name: 'characteristic_sets' })
@Index('characteristic_sets_organisation_id_idx', ['organisationId'])
@Index('characteristic_sets_project_id_idx', ['projectId'])
export class CharacteristicSetEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'characteristic_sets_project_id_fkey' })
  project!: Relation<ProjectEntity>;

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
