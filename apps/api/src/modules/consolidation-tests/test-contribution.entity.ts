import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ConsolidationTestEntity } from './consolidation-test.entity.js';

/** What a person changed of a test: its set-up (specimen, apparatus, technician), its picks, or its readings. */
export const CONTRIBUTION_KINDS = ['set-up', 'picks', 'readings'] as const;
export type ContributionKind = (typeof CONTRIBUTION_KINDS)[number];

/**
 * Who changed what of a test, and when: kept so that nobody approves work they did
 * themselves (reviews.service.ts), whoever the test's technician is. Insert-only.
 */
@Entity({ name: 'test_contributions' })
@Index('test_contributions_test_id_at_idx', ['testId', 'at'])
@Index('test_contributions_organisation_id_idx', ['organisationId'])
@Check('test_contributions_kind_check', `"kind" IN ('set-up', 'picks', 'readings')`)
export class TestContributionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @ManyToOne(() => ConsolidationTestEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'test_id', foreignKeyConstraintName: 'test_contributions_test_id_fkey' })
  test!: Relation<ConsolidationTestEntity>;

  @Column('uuid', { name: 'user_id' })
  userId!: string;

  @Column('text')
  kind!: ContributionKind;

  @CreateDateColumn({ type: 'timestamptz' })
  at!: Date;
}
