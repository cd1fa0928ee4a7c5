import type { Role } from '@porestack/types';
import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { OrganisationEntity } from '../organisations/organisation.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** An e-mailed offer to join an organisation with one or more roles. Only the token's sha256 is stored. */
@Entity({ name: 'invitations' })
@Index('invitations_organisation_id_idx', ['organisationId'])
@Index('invitations_token_hash_key', ['tokenHash'], { unique: true })
@Check('invitations_roles_not_empty', 'cardinality("roles") > 0')
export class InvitationEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id', foreignKeyConstraintName: 'invitations_organisation_id_fkey' })
  organisation!: Relation<OrganisationEntity>;

  @Column('text')
  email!: string;

  /** The roles the membership gets on acceptance, as in MembershipEntity.roles. */
  @Column('text', { array: true })
  roles!: Role[];

  @Column('text', { name: 'token_hash' })
  tokenHash!: string;

  @Column('uuid', { name: 'invited_by_id' })
  invitedById!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'invited_by_id', foreignKeyConstraintName: 'invitations_invited_by_id_fkey' })
  invitedBy!: Relation<UserEntity>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @Column('timestamptz', { name: 'expires_at' })
  expiresAt!: Date;

  @Column('timestamptz', { name: 'accepted_at', nullable: true })
  acceptedAt!: Date | null;

  @Column('timestamptz', { name: 'revoked_at', nullable: true })
  revokedAt!: Date | null;
}
