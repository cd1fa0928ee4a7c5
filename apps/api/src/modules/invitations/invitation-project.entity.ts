import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ProjectEntity } from '../projects/project.entity.js';
import { InvitationEntity } from './invitation.entity.js';

/**
 * A project shared with someone who is not yet a member: accepting the invitation puts them on
 * the project as its client (project_members). Withdrawing the share removes the row.
 */
@Entity({ name: 'invitation_projects' })
@Index('invitation_projects_organisation_id_idx', ['organisationId'])
@Index('invitation_projects_project_id_idx', ['projectId'])
@Index('invitation_projects_invitation_project_key', ['invitationId', 'projectId'], { unique: true })
export class InvitationProjectEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'invitation_id' })
  invitationId!: string;

  @ManyToOne(() => InvitationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'invitation_id', foreignKeyConstraintName: 'invitation_projects_invitation_id_fkey' })
  invitation!: Relation<InvitationEntity>;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'project_id', foreignKeyConstraintName: 'invitation_projects_project_id_fkey' })
  project!: Relation<ProjectEntity>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
