import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A person who can sign in. Not tenant-owned: one account may belong to several organisations. */
@Entity({ name: 'users' })
@Index('users_email_key', ['email'], { unique: true })
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** Stored lower-case (the shared schema lower-cases it), so the unique index is case-blind. */
  @Column('text')
  email!: string;

  @Column('text')
  name!: string;

  @Column('text', { name: 'password_hash' })
  passwordHash!: string;

  /** Bumped when the password changes: sessions carrying an older version are refused. */
  @Column('integer', { name: 'session_version', default: 0 })
  sessionVersion!: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
