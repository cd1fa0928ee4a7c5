import type { Role } from '@porestack/types';
import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { OrganisationEntity } from './organisation.entity.js';

/** One user's roles in one organisation. */
@Entity({ name: 'memberships' })
@Index('memberships_organisation_id_idx', ['organisationId'])
@Index('memberships_user_id_idx', ['userId'])
@Index('memberships_organisation_user_key', ['organisationId', 'userId'], { unique: true })
@Check('memberships_roles_not_empty', 'cardinality("roles") > 0')
export class MembershipEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id', foreignKeyConstraintName: 'memberships_organisation_id_fkey' })
  organisation!: Relation<OrganisationEntity>;

  @Column('uuid', { name: 'user_id' })
  userId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'memberships_user_id_fkey' })
  user!: Relation<UserEntity>;

  /**
   * One or more of ROLES in @porestack/types, each once, in ROLES' order (canonicalRoles);
   * text rather than a PostgreSQL enum so new roles need no type migration.
   */
  @Column('text', { array: true })
  roles!: Role[];

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
