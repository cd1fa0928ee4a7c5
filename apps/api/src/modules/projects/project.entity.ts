import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { OrganisationEntity } from '../organisations/organisation.entity.js';

/** A job the laboratory does for a client: the site investigation its samples come from. */
@Entity({ name: 'projects' })
@Index('projects_organisation_id_idx', ['organisationId'])
@Index('projects_organisation_reference_key', ['organisationId', 'reference'], { unique: true })
export class ProjectEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'organisation_id', foreignKeyConstraintName: 'projects_organisation_id_fkey' })
  organisation!: Relation<OrganisationEntity>;

  @Column('text')
  name!: string;

  /** The laboratory's job number, unique within the organisation. */
  @Column('text')
  reference!: string;

  @Column('text', { name: 'client_name' })
  clientName!: string;

  @Column('text', { name: 'site_name', default: '' })
  siteName!: string;

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt!: Date;
}
