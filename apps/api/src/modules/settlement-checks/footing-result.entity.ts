import type { FootingSettlementResult } from '@porestack/types';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { CheckRevisionEntity } from './check-revision.entity.js';

/**
 * One footing's full result in a revision (sublayer rows, points, time curve): kept apart so a
 * page of 1,000 footings loads the headline numbers without 40,000 sublayer rows. Append-only.
 */
@Entity({ name: 'settlement_check_footing_results' })
@Index('settlement_check_footing_results_organisation_id_idx', ['organisationId'])
@Index('settlement_check_footing_results_revision_footing_key', ['revisionId', 'footingId'], { unique: true })
export class FootingResultEntity {
  @PrimaryColumn('uuid', { name: 'revision_id' })
  revisionId!: string;

  @ManyToOne(() => CheckRevisionEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'settlement_check_footing_results_revision_id_fkey' })
  revisionRow!: Relation<CheckRevisionEntity>;

  @PrimaryColumn('integer', { name: 'footing_index' })
  footingIndex!: number;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('text', { name: 'footing_id' })
  footingId!: string;

  /** json, like the revision's result: read whole, never queried inside. */
  @Column('json')
  detail!: FootingSettlementResult;
}
