import type { ConsolidationTestResult, Picks } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';

/** One run of geo-core on a test's stored readings: the full result, kept as produced. */
@Entity({ name: 'analyses' })
@Index('analyses_organisation_id_idx', ['organisationId'])
@Index('analyses_test_id_created_at_idx', ['testId', 'createdAt'])
export class AnalysisEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @ManyToOne(() => ConsolidationTestEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'test_id', foreignKeyConstraintName: 'analyses_test_id_fkey' })
  test!: Relation<ConsolidationTestEntity>;

  @Column('text', { name: 'geo_core_version' })
  geoCoreVersion!: string;

  /** SHA-256 (hex) of the canonical geo-core input and version: equal hashes, equal results. */
  @Column('text', { name: 'inputs_hash' })
  inputsHash!: string;

  /** The input as given to geo-core (specimen, increments' identity, compliance, picks) is hashed; the picks are kept. */
  @Column('jsonb', { default: () => "'{}'" })
  picks!: Picks;

  @Column('text', { name: 'pick_reason', nullable: true })
  pickReason!: string | null;

  @Column('uuid', { name: 'upload_id', nullable: true })
  uploadId!: string | null;

  /** geo-core's ConsolidationTestResult, checked against ConsolidationTestResultSchema before it is stored. */
  @Column('jsonb')
  result!: ConsolidationTestResult;

  @Column('integer', { name: 'warning_count' })
  warningCount!: number;

  @Column('integer', { name: 'reading_count' })
  readingCount!: number;

  @Column('uuid', { name: 'requested_by_id', nullable: true })
  requestedById!: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
