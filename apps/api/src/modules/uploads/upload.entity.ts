import type { DetectedFileType, ImportIssue, ImportMapping, ImportNote, UploadStatus } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** Why an import failed: the message, the first rejected rows and how many there were. */
export interface UploadFailure {
  message: string;
  issues: ImportIssue[];
  issueCount: number;
}

/**
 * A readings file as uploaded: the original bytes are kept unchanged in object storage
 * under `object_key` (orgs/<org>/tests/<test>/uploads/<upload>/<safe name>), with their
 * SHA-256, so every stored reading can be traced back to the file it came from.
 */
@Entity({ name: 'uploads' })
@Index('uploads_organisation_id_idx', ['organisationId'])
@Index('uploads_test_id_created_at_idx', ['testId', 'createdAt'])
// The target of the readings' (test_id, upload_id) foreign key.
@Index('uploads_test_id_id_key', ['testId', 'id'], { unique: true })
// Another test holding the same file is looked up by its hash on every upload.
@Index('uploads_organisation_id_sha256_idx', ['organisationId', 'sha256'])
export class UploadEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @ManyToOne(() => ConsolidationTestEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'test_id', foreignKeyConstraintName: 'uploads_test_id_fkey' })
  test!: Relation<ConsolidationTestEntity>;

  @Column('text', { name: 'object_key' })
  objectKey!: string;

  /** The name the file had on the uploader's computer, as sent. */
  @Column('text', { name: 'original_name' })
  originalName!: string;

  /** Hex SHA-256 of the stored bytes. */
  @Column('text')
  sha256!: string;

  @Column('integer', { name: 'size_bytes' })
  sizeBytes!: number;

  /** From the content, not the name. */
  @Column('text', { name: 'detected_type' })
  detectedType!: DetectedFileType;

  @Column('text')
  status!: UploadStatus;

  @Column('uuid', { name: 'uploaded_by_id' })
  uploadedById!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'uploaded_by_id', foreignKeyConstraintName: 'uploads_uploaded_by_id_fkey' })
  uploadedBy!: Relation<UserEntity>;

  /** The mapping of the last import attempt (the canonical one for a canonical file). */
  @Column('jsonb', { nullable: true })
  mapping!: ImportMapping | null;

  @Column('jsonb', { nullable: true })
  failure!: UploadFailure | null;

  /** What the last import dropped, replaced or found implausible (first 200). */
  @Column('jsonb', { default: () => "'[]'" })
  notes!: ImportNote[];

  @Column('integer', { name: 'note_count', default: 0 })
  noteCount!: number;

  @Column('integer', { name: 'reading_count', nullable: true })
  readingCount!: number | null;

  @Column('integer', { name: 'increment_count', nullable: true })
  incrementCount!: number | null;

  /** Key/values of the workbook's "specimen" sheet, if it had one. */
  @Column('jsonb', { name: 'specimen_values', default: () => "'{}'" })
  specimenValues!: Record<string, string | number>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;

  @Column('timestamptz', { name: 'imported_at', nullable: true })
  importedAt!: Date | null;
}
