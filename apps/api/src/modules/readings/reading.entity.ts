import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { UploadEntity } from '../uploads/upload.entity.js';

/**
 * One reading of a test, in kPa, minutes and mm (compression positive), as imported.
 * A test holds the readings of one upload at a time; the key (test, sheet, row number) needs no
 * generated id, which keeps COPY of 200,000 rows fast. Written only by the bulk import.
 * One foreign key, (test_id, upload_id) → uploads (test_id, id): a reading's test is its
 * upload's test, and deleting a test or an upload takes its readings along. (A key per
 * column would be checked twice per row: measured, 2 s of a 3 s COPY of 200,000 rows.)
 */
@Entity({ name: 'readings' })
@Index('readings_organisation_id_idx', ['organisationId'])
export class ReadingEntity {
  @PrimaryColumn('uuid', { name: 'test_id', primaryKeyConstraintName: 'readings_pkey' })
  testId!: string;

  /** The sheet it came from: 0 for a CSV or a workbook's first sheet, n for the (n+1)th of one sheet per increment. */
  @PrimaryColumn('smallint', { name: 'sheet_index', primaryKeyConstraintName: 'readings_pkey', default: 0 })
  sheetIndex!: number;

  /** The row of the file (of its sheet) it came from, as a spreadsheet numbers it (header = row 1). */
  @PrimaryColumn('integer', { name: 'row_number', primaryKeyConstraintName: 'readings_pkey' })
  rowNumber!: number;

  @Column('uuid', { name: 'organisation_id' })
  organisationId!: string;

  @Column('uuid', { name: 'upload_id' })
  uploadId!: string;

  @ManyToOne(() => UploadEntity, { onDelete: 'CASCADE' })
  @JoinColumn([
    { name: 'test_id', referencedColumnName: 'testId', foreignKeyConstraintName: 'readings_upload_fkey' },
    { name: 'upload_id', referencedColumnName: 'id', foreignKeyConstraintName: 'readings_upload_fkey' },
  ])
  upload!: Relation<UploadEntity>;

  @Column('integer', { name: 'increment_index' })
  incrementIndex!: number;

  @Column('double precision', { name: 'stress_kpa' })
  stressKpa!: number;

  @Column('double precision', { name: 'elapsed_min' })
  elapsedMin!: number;

  @Column('double precision', { name: 'deformation_mm' })
  deformationMm!: number;
}
