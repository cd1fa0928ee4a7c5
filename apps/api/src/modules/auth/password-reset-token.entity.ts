import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';

/** A one-time password-reset link. Only the token's sha256 is stored. Not tenant-owned. */
@Entity({ name: 'password_reset_tokens' })
@Index('password_reset_tokens_user_id_idx', ['userId'])
@Index('password_reset_tokens_token_hash_key', ['tokenHash'], { unique: true })
export class PasswordResetTokenEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'user_id' })
  userId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'password_reset_tokens_user_id_fkey' })
  user!: Relation<UserEntity>;

  @Column('text', { name: 'token_hash' })
  tokenHash!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @Column('timestamptz', { name: 'expires_at' })
  expiresAt!: Date;

  @Column('timestamptz', { name: 'used_at', nullable: true })
  usedAt!: Date | null;
}
