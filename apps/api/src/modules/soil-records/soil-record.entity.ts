import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';

/** The approved parameters of one test over time: a head row whose versions are immutable. */
@Entity({ name: 'soil_records' })
@Index('soil_records_organisation_id_idx', ['organisationId'])
@Index('soil_records_test_id_key', ['testId'], { unique: true })
export class SoilRecordEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @ManyToOne(() => ConsolidationTestEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'test_id', foreignKeyConstraintName: 'soil_records_test_id_fkey' })
  test!: Relation<ConsolidationTestEntity>;

  @Column('uuid', { name: 'sample_id' })
  sampleId!: string;

  @Column('uuid', { name: 'project_id' })
  projectId!: string;

  /** The newest version's number (the versions themselves never change). */
  @Column('integer', { name: 'current_version' })
  currentVersion!: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
