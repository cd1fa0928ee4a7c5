import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { SoilRecordEntity } from './soil-record.entity.js';

/**
 * One approved set of parameters. Rows are append-only: a trigger in the `lab-records`
 * migration raises on any UPDATE or DELETE, so no code path (nor a person at psql) can
 * change what was signed off. Superseding is recorded in soil_record_supersessions.
 */
@Entity({ name: 'soil_record_versions' })
@Index('soil_record_versions_organisation_id_idx', ['organisationId'])
@Index('soil_record_versions_record_version_key', ['recordId', 'version'], { unique: true })
export class SoilRecordVersionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'record_id' })
  recordId!: string;

  @ManyToOne(() => SoilRecordEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'record_id', foreignKeyConstraintName: 'soil_record_versions_record_id_fkey' })
  record!: Relation<SoilRecordEntity>;

  @Column('integer')
  version!: number;

  @Column('uuid', { name: 'test_id' })
  testId!: string;

  @Column('uuid', { name: 'analysis_id' })
  analysisId!: string;

  @Column('uuid', { name: 'upload_id', nullable: true })
  uploadId!: string | null;

  /** SHA-256 of the uploaded file the readings came from. */
  @Column('text', { name: 'upload_sha256', nullable: true })
  uploadSha256!: string | null;

  @Column('text', { name: 'geo_core_version' })
  geoCoreVersion!: string;

  @Column('double precision', { name: 'initial_void_ratio' })
  initialVoidRatio!: number;

  @Column('double precision', { name: 'compression_index', nullable: true })
  compressionIndex!: number | null;

  @Column('double precision', { name: 'recompression_index', nullable: true })
  recompressionIndex!: number | null;

  @Column('double precision', { name: 'swell_index', nullable: true })
  swellIndex!: number | null;

  @Column('double precision', { name: 'preconsolidation_casagrande_kpa', nullable: true })
  preconsolidationCasagrandeKpa!: number | null;

  @Column('double precision', { name: 'preconsolidation_pacheco_silva_kpa', nullable: true })
  preconsolidationPachecoSilvaKpa!: number | null;

  @Column('double precision', { name: 'preconsolidation_adopted_kpa', nullable: true })
  preconsolidationAdoptedKpa!: number | null;

  /** 'pick' | 'casagrande' | 'pacheco-silva' */
  @Column('text', { name: 'preconsolidation_adopted_from', nullable: true })
  preconsolidationAdoptedFrom!: string | null;

  @Column('double precision', { name: 'overconsolidation_ratio', nullable: true })
  overconsolidationRatio!: number | null;

  @Column('double precision', { name: 'cv_min_m2_per_yr', nullable: true })
  cvMinM2PerYr!: number | null;

  @Column('double precision', { name: 'cv_max_m2_per_yr', nullable: true })
  cvMaxM2PerYr!: number | null;

  /** Cα of the virgin-range loading increments (median). */
  @Column('double precision', { name: 'secondary_compression_index', nullable: true })
  secondaryCompressionIndex!: number | null;

  @Column('text', { name: 'sample_quality', nullable: true })
  sampleQuality!: string | null;

  @Column('uuid', { name: 'approved_by_id' })
  approvedById!: string;

  @CreateDateColumn({ name: 'approved_at', type: 'timestamptz' })
  approvedAt!: Date;
}
