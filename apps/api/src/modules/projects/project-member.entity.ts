import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { ProjectEntity } from './project.entity.js';

/** A designer attached to a project: told when a soil record version of it is approved. */
@Entity({ name: 'project_members' })
@Index('project_members_organisation_id_idx', ['organisationId'])
@Index('project_members_project_user_key', ['projectId', 'userId'], { unique: true })
export class ProjectMemberEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'project_members_project_id_fkey' })
  project!: Relation<ProjectEntity>;

  @Column('uuid', { name: 'user_id' })
  userId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'project_members_user_id_fkey' })
  user!: Relation<UserEntity>;

  /** 'designer' for now; text so other project roles need no type migration. */
  @Column('text', { default: 'designer' })
  role!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
