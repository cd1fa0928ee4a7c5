import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * Who did what to which object, when. `organisation_id` is null for events outside any
 * tenant (sign-in, sign-out, password reset). No foreign keys: the log outlives what it names.
 */
@Entity({ name: 'audit_entries' })
@Index('audit_entries_organisation_id_at_idx', ['organisationId', 'at'])
export class AuditEntryEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id', nullable: true })
  organisationId!: string | null;

  @Column('uuid', { name: 'actor_user_id', nullable: true })
  actorUserId!: string | null;

  @Column('text')
  action!: string;

  @Column('text', { name: 'object_type' })
  objectType!: string;

  @Column('text', { name: 'object_id', nullable: true })
  objectId!: string | null;

  @Column('jsonb', { default: () => "'{}'" })
  details!: Record<string, unknown>;

  @Column('timestamptz', { default: () => 'now()' })
  at!: Date;
}
