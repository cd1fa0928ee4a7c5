import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A sign-up waiting for its e-mailed link. Every sign-up is answered the same way whether or
 * not the address already has an account; the mail then either finishes the sign-up or says
 * the account exists. Only the link's sha256 is stored, set when the mail is sent. Not
 * tenant-owned.
 */
@Entity({ name: 'sign_up_requests' })
@Index('sign_up_requests_token_hash_key', ['tokenHash'], { unique: true })
export class SignUpRequestEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('text')
  email!: string;

  @Column('text')
  name!: string;

  @Column('text', { name: 'organisation_name' })
  organisationName!: string;

  @Column('text', { name: 'password_hash' })
  passwordHash!: string;

  @Column('text', { name: 'token_hash', nullable: true })
  tokenHash!: string | null;

  @Column('timestamptz', { name: 'expires_at' })
  expiresAt!: Date;

  @Column('timestamptz', { name: 'used_at', nullable: true })
  usedAt!: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
