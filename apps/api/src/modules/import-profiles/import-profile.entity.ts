import type { ImportMapping } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { OrganisationEntity } from '../organisations/organisation.entity.js';

/** A named mapping an organisation saved for its loggers' layout, reused on later uploads. */
@Entity({ name: 'import_profiles' })
@Index('import_profiles_organisation_name_key', ['organisationId', 'name'], { unique: true })
export class ImportProfileEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id', foreignKeyConstraintName: 'import_profiles_organisation_id_fkey' })
  organisation!: Relation<OrganisationEntity>;

  @Column('text')
  name!: string;

  @Column('jsonb')
  mapping!: ImportMapping;

  @Column('uuid', { name: 'created_by_id', nullable: true })
  createdById!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
