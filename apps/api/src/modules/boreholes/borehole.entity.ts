import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ProjectEntity } from '../projects/project.entity.js';

/** A borehole of a project, with the groundwater level met in it (for the in-situ stress estimate). */
@Entity({ name: 'boreholes' })
@Index('boreholes_organisation_id_idx', ['organisationId'])
@Index('boreholes_project_name_key', ['projectId', 'name'], { unique: true })
export class BoreholeEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'boreholes_project_id_fkey' })
  project!: Relation<ProjectEntity>;

  @Column('text')
  name!: string;

  /** Ground level, m above ordnance datum. */
  @Column('double precision', { name: 'ground_level_m_od', nullable: true })
  groundLevelMOd!: number | null;

  /** Groundwater depth below ground level, m; null when none was met. */
  @Column('double precision', { name: 'water_table_depth_m', nullable: true })
  waterTableDepthM!: number | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
