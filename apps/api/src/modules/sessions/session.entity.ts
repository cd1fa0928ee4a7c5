import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';

/**
 * One signed-in browser. The session cookie names it, so signing out ends it on the server:
 * a copy of the cookie taken before sign-out no longer works.
 */
@Entity({ name: 'sessions' })
@Index('sessions_user_id_idx', ['userId'])
export class SessionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'user_id' })
  userId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'sessions_user_id_fkey' })
  user!: Relation<UserEntity>;

  @Column('timestamptz', { name: 'expires_at' })
  expiresAt!: Date;

  /** Set at sign-out; an ended session is refused. */
  @Column('timestamptz', { name: 'ended_at', nullable: true })
  endedAt!: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
