import type { ReviewDecision } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';

/** A step of a test's review: submitted, approved or changes requested, with the comment. */
@Entity({ name: 'review_events' })
@Index('review_events_organisation_id_idx', ['organisationId'])
@Index('review_events_test_id_at_idx', ['testId', 'at'])
export class ReviewEventEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @ManyToOne(() => ConsolidationTestEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'test_id', foreignKeyConstraintName: 'review_events_test_id_fkey' })
  test!: Relation<ConsolidationTestEntity>;

  /** One of REVIEW_DECISIONS in @porestack/types. */
  @Column('text')
  decision!: ReviewDecision;

  @Column('text', { nullable: true })
  comment!: string | null;

  @Column('uuid', { name: 'actor_id' })
  actorId!: string;

  @Column('uuid', { name: 'analysis_id', nullable: true })
  analysisId!: string | null;

  @CreateDateColumn({ name: 'at', type: 'timestamptz' })
  at!: Date;
}
