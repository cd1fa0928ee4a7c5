import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { BoreholeEntity } from '../boreholes/borehole.entity.js';

/**
 * A sample taken from a borehole. The in-situ vertical effective stress is either entered,
 * or estimated from the bulk unit weight and the borehole's water table (see in-situ-stress.ts).
 */
@Entity({ name: 'samples' })
@Index('samples_organisation_id_idx', ['organisationId'])
@Index('samples_borehole_reference_key', ['boreholeId', 'reference'], { unique: true })
export class SampleEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'borehole_id' })
  boreholeId!: string;

  @ManyToOne(() => BoreholeEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'borehole_id', foreignKeyConstraintName: 'samples_borehole_id_fkey' })
  borehole!: Relation<BoreholeEntity>;

  @Column('text')
  reference!: string;

  /** Below ground level, m. */
  @Column('double precision', { name: 'top_depth_m' })
  topDepthM!: number;

  @Column('double precision', { name: 'bottom_depth_m' })
  bottomDepthM!: number;

  @Column('text', { default: '' })
  description!: string;

  @Column('double precision', { name: 'bulk_unit_weight_kn_per_m3', nullable: true })
  bulkUnitWeightKnPerM3!: number | null;

  /** As entered by the laboratory; null when it is to be estimated. */
  @Column('double precision', { name: 'in_situ_stress_kpa', nullable: true })
  inSituStressKpa!: number | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt!: Date;
}
