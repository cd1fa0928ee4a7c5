import type { GroundModelContent } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { GroundModelEntity } from './ground-model.entity.js';

/**
 * One saved state of a ground model, with every layer's parameters resolved from its source
 * (record version, characteristic set revision or hand entry). Append-only: a trigger in the
 * `design` migration refuses UPDATE and DELETE, so a check that pinned it can always be re-read.
 */
@Entity({ name: 'ground_model_revisions' })
@Index('ground_model_revisions_organisation_id_idx', ['organisationId'])
@Index('ground_model_revisions_model_revision_key', ['groundModelId', 'revision'], { unique: true })
export class GroundModelRevisionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'ground_model_id' })
  groundModelId!: string;

  @ManyToOne(() => GroundModelEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ground_model_id', foreignKeyConstraintName: 'ground_model_revisions_ground_model_id_fkey' })
  groundModel!: Relation<GroundModelEntity>;

  @Column('integer')
  revision!: number;

  @Column('text')
  name!: string;

  @Column('text', { default: '' })
  note!: string;

  @Column('jsonb')
  content!: GroundModelContent;

  /** The soil record versions the layers take values from (for "newer parameters approved"). */
  @Column('uuid', { name: 'record_version_ids', array: true, default: () => "'{}'" })
  recordVersionIds!: string[];

  @Column('uuid', { name: 'set_revision_ids', array: true, default: () => "'{}'" })
  setRevisionIds!: string[];

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
