import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { ProjectEntity } from './project.entity.js';

/**
 * A person's place on a project, which project-scope.ts reads: a designer on the project's
 * designers list (told when a soil record version of it is approved), or a client the project
 * is shared with (reads its approved results).
 */
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

  /** 'designer' or 'client'; text so other project roles need no type migration. */
  @Column('text', { default: 'designer' })
  role!: string;

  /** Who put them on the project (null for places made before this was kept, or by a removed user). */
  @Column('uuid', { name: 'added_by_id', nullable: true })
  addedById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'added_by_id', foreignKeyConstraintName: 'project_members_added_by_id_fkey' })
  addedBy!: Relation<UserEntity> | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
