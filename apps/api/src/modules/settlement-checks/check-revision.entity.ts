import type { CheckOptions, CheckRunResult, FootingRow } from '@porestack/types';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { GroundModelRevisionEntity } from '../ground-models/ground-model-revision.entity.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

/** What the engine took for each footing: its net pressure and the overburden it was netted against. */
export interface FootingAsRun {
  id: string;
  shape: string;
  grossPressureKpa: number;
  overburdenKpa: number;
  netPressureKpa: number;
}

/**
 * One run of a check, frozen: the inputs, the ground model revision (and through it the record
 * and set versions) it pinned, the geo-core version and the result. Each footing's sublayer rows
 * and time curve are in settlement_check_footing_results. Append-only (trigger in `design`).
 */
@Entity({ name: 'settlement_check_revisions' })
@Index('settlement_check_revisions_organisation_id_idx', ['organisationId'])
@Index('settlement_check_revisions_check_revision_key', ['checkId', 'revision'], { unique: true })
export class CheckRevisionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'check_id' })
  checkId!: string;

  @ManyToOne(() => SettlementCheckEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'check_id', foreignKeyConstraintName: 'settlement_check_revisions_check_id_fkey' })
  check!: Relation<SettlementCheckEntity>;

  @Column('integer')
  revision!: number;

  /** Why this run was made: "Run", "Re-run with newer parameters", "F3 sized by the tool" … */
  @Column('text')
  reason!: string;

  @Column('uuid', { name: 'ground_model_revision_id' })
  groundModelRevisionId!: string;

  @ManyToOne(() => GroundModelRevisionEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ground_model_revision_id', foreignKeyConstraintName: 'settlement_check_revisions_ground_model_revision_id_fkey' })
  groundModelRevision!: Relation<GroundModelRevisionEntity>;

  @Column('jsonb')
  footings!: FootingRow[];

  @Column('jsonb')
  options!: CheckOptions;

  @Column('jsonb', { name: 'footings_as_run' })
  footingsAsRun!: FootingAsRun[];

  /**
   * geo-core's result, each footing without its sublayer rows and time curve. json, not jsonb:
   * it is only ever read whole, and PostgreSQL takes json text about three times faster than it
   * converts jsonb (a 100-footing result with every pair judged is 5 MB).
   */
  @Column('json')
  result!: CheckRunResult;

  @Column('jsonb', { default: () => "'[]'" })
  warnings!: string[];

  @Column('text', { name: 'geo_core_version' })
  geoCoreVersion!: string;

  @Column('double precision', { name: 'duration_ms' })
  durationMs!: number;

  @Column('double precision', { name: 'max_total_m' })
  maxTotalM!: number;

  @Column('integer', { name: 'pairs_over_limit' })
  pairsOverLimit!: number;

  @Column('integer', { name: 'footings_over_limit' })
  footingsOverLimit!: number;

  @Column('uuid', { name: 'created_by_id' })
  createdById!: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
