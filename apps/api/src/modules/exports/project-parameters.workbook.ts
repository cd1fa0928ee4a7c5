import ExcelJS from 'exceljs';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { REPORT_CAUTION } from '../reports/report-caution.js';
import { safeReportFileName } from '../reports/report-file-name.js';
import { addFactsSheet, addTableSheet, type ExportColumn } from './xlsx-sheet.js';

type Row = Record<string, unknown>;
const num = (key: string) => (row: Row) => (row[key] === null || row[key] === undefined ? null : Number(row[key]));
const text = (key: string) => (row: Row) => (row[key] === null || row[key] === undefined ? null : String(row[key]));

/** One row per approved version, newest approvals of each record first; superseded ones say by which. */
const COLUMNS: ExportColumn<Row>[] = [
  { header: 'Borehole', value: text('borehole_name') },
  { header: 'Sample', value: text('sample_reference') },
  { header: 'Top depth (m)', format: '0.00', value: num('top_depth_m') },
  { header: 'Bottom depth (m)', format: '0.00', value: num('bottom_depth_m') },
  { header: 'Description', width: 30, value: text('description') },
  { header: 'Source test', value: text('test_reference') },
  { header: 'Source test id', width: 38, value: text('test_id') },
  { header: 'Soil record id', width: 38, value: text('record_id') },
  { header: 'Version', format: '0', value: num('version') },
  { header: 'Version id', width: 38, value: text('version_id') },
  { header: 'Status', value: (r) => (r['superseded_by'] === null ? 'current' : `superseded by version ${String(r['superseded_by'])}`) },
  { header: 'Approved (UTC)', width: 20, format: 'yyyy-mm-dd hh:mm', value: (r) => r['approved_at'] as Date },
  { header: 'Approved by', width: 22, value: text('approver_name') },
  { header: 'e0 (–)', format: '0.000', value: num('initial_void_ratio') },
  { header: 'Cc (–)', format: '0.000', value: num('compression_index') },
  { header: 'Cr (–)', format: '0.000', value: num('recompression_index') },
  { header: 'Cs (–)', format: '0.000', value: num('swell_index') },
  { header: 'σ′p Casagrande (kPa)', format: '0', value: num('preconsolidation_casagrande_kpa') },
  { header: 'σ′p Pacheco Silva (kPa)', format: '0', value: num('preconsolidation_pacheco_silva_kpa') },
  { header: 'σ′p adopted (kPa)', format: '0', value: num('preconsolidation_adopted_kpa') },
  { header: 'σ′p adopted from', value: (r) => ({ pick: 'reviewer', casagrande: 'Casagrande', 'pacheco-silva': 'Pacheco Silva' })[String(r['preconsolidation_adopted_from'])] ?? null },
  { header: 'OCR (–)', format: '0.00', value: num('overconsolidation_ratio') },
  { header: 'cv min (m²/yr)', format: '0.000', value: num('cv_min_m2_per_yr') },
  { header: 'cv max (m²/yr)', format: '0.000', value: num('cv_max_m2_per_yr') },
  { header: 'Cα (–)', format: '0.0000', value: num('secondary_compression_index') },
  { header: 'Sample quality', width: 22, value: text('sample_quality') },
  { header: 'geo-core version', value: text('geo_core_version') },
  { header: 'Readings file SHA-256', width: 66, value: text('upload_sha256') },
];

/** A project's approved parameters as a workbook: every version of every soil record. */
export async function projectParametersWorkbook(orgId: string, projectId: string): Promise<{ bytes: Buffer; fileName: string }> {
  const [project] = (await dataSource.query('SELECT p.name, p.reference, p.client_name, o.name AS org_name FROM projects p JOIN organisations o ON o.id = p.organisation_id WHERE p.organisation_id = $1 AND p.id = $2', [
    orgId,
    projectId,
  ])) as Row[];
  if (!project) throw new NotFoundError('project');
  const rows = (await dataSource.query(
    `SELECT b.name AS borehole_name, s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m, s.description,
            t.reference AS test_reference, t.id AS test_id, r.id AS record_id, v.id AS version_id, v.*, u.name AS approver_name, next.version AS superseded_by
       FROM soil_records r
       JOIN soil_record_versions v ON v.record_id = r.id
       JOIN consolidation_tests t ON t.id = r.test_id
       JOIN samples s ON s.id = r.sample_id
       JOIN boreholes b ON b.id = s.borehole_id
       JOIN users u ON u.id = v.approved_by_id
       LEFT JOIN soil_record_supersessions ss ON ss.version_id = v.id
       LEFT JOIN soil_record_versions next ON next.id = ss.superseded_by_id
      WHERE r.organisation_id = $1 AND r.project_id = $2
      ORDER BY b.name, s.top_depth_m, t.reference, v.version DESC`,
    [orgId, projectId],
  )) as Row[];
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Porestack';
  workbook.created = new Date();
  addTableSheet(workbook, 'Approved parameters', COLUMNS, rows);
  addFactsSheet(workbook, 'About', [
    ['Laboratory', String(project['org_name'])],
    ['Project', `${String(project['name'])} (${String(project['reference'])})`],
    ['Client', String(project['client_name'])],
    ['Exported (UTC)', new Date(), 'yyyy-mm-dd hh:mm'],
    ['Rows', rows.length],
    ['What this is', 'One row per approved soil record version. Versions are immutable; a superseded version stays listed with the version that replaced it.'],
    ['Caution', REPORT_CAUTION],
  ]);
  return { bytes: Buffer.from(await workbook.xlsx.writeBuffer()), fileName: safeReportFileName(`approved-parameters-${String(project['reference'])}.xlsx`) };
}
