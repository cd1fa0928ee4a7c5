import { Column, CreateDateColumn, Entity, Index, JoinColumn, OneToOne, PrimaryColumn, type Relation } from 'typeorm';
import { SoilRecordVersionEntity } from './soil-record-version.entity.js';

/**
 * "Version N was superseded by version N+1 at …" — kept apart from the versions so the
 * version rows never need an UPDATE. Append-only as well (same trigger).
 */
@Entity({ name: 'soil_record_supersessions' })
@Index('soil_record_supersessions_organisation_id_idx', ['organisationId'])
export class SoilRecordSupersessionEntity {
  @PrimaryColumn('uuid', { name: 'version_id' })
  versionId!: string;

  @OneToOne(() => SoilRecordVersionEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'version_id', foreignKeyConstraintName: 'soil_record_supersessions_version_id_fkey' })
  version!: Relation<SoilRecordVersionEntity>;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'superseded_by_id' })
  supersededById!: string;

  @CreateDateColumn({ name: 'superseded_at', type: 'timestamptz' })
  supersededAt!: Date;
}
