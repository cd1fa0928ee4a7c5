import type { CharacteristicSetRevision } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { CharacteristicSetEntity } from './characteristic-set.entity.js';

/**
 * One saved state of a characteristic set: the versions it used, the statistics as they were
 * and the adopted values with their notes. Append-only (trigger in the `design` migration).
 */
@Entity({ name: 'characteristic_set_revisions' })
@Index('characteristic_set_revisions_organisation_id_idx', ['organisationId'])
@Index('characteristic_set_revisions_set_revision_key', ['setId', 'revision'], { unique: true })
export class CharacteristicSetRevisionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'set_id' })
  setId!: string;

  @ManyToOne(() => CharacteristicSetEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'set_id', foreignKeyConstraintName: 'characteristic_set_revisions_set_id_fkey' })
  set!: Relation<CharacteristicSetEntity>;

  @Column('integer')
  revision!: number;

  @Column('text')
  name!: string;

  @Column('text', { default: '' })
  note!: string;

  @Column('uuid', { name: 'record_version_ids', array: true })
  recordVersionIds!: string[];

  @Column('jsonb')
  adopted!: CharacteristicSetRevision['adopted'];

  /** The members and statistics as they were when saved. */
  @Column('jsonb')
  members!: CharacteristicSetRevision['members'];

  @Column('jsonb')
  statistics!: CharacteristicSetRevision['statistics'];

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
