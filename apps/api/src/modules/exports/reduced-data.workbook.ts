import type { ConsolidationIncrementResult } from '@porestack/types';
import ExcelJS from 'exceljs';
import { cvRange, representativeSecondaryIndex } from '../analyses/key-parameters.js';
import { REPORT_CAUTION } from '../reports/report-caution.js';
import { safeReportFileName } from '../reports/report-file-name.js';
import type { TestRecord } from '../reports/test-report/test-record.js';
import { addFactsSheet, addTableSheet, type ExportColumn } from './xlsx-sheet.js';

type Increment = ConsolidationIncrementResult;

const INCREMENT_COLUMNS: ExportColumn<Increment>[] = [
  { header: 'Increment', format: '0', value: (i) => i.index },
  { header: 'σ′ (kPa)', format: '0.0', value: (i) => i.stressKpa },
  { header: 'Stage', value: (i) => i.kind },
  { header: 'Readings', format: '0', value: (i) => i.readingCount },
  { header: 'Apparatus deflection (mm)', format: '0.0000', value: (i) => i.apparatusDeflectionMm },
  { header: 'Deformation at end (mm)', format: '0.0000', value: (i) => i.deformationEndMm },
  { header: 'Height at end (mm)', format: '0.000', value: (i) => i.heightEndMm },
  { header: 'Void ratio at end (–)', format: '0.0000', value: (i) => i.voidRatioEnd },
  { header: 'Strain at end (%)', format: '0.00', value: (i) => i.strainEnd * 100 },
  { header: 'Void ratio at end of primary (–)', format: '0.0000', value: (i) => i.voidRatioEndOfPrimary },
  { header: 'av (1/MPa)', format: '0.0000', value: (i) => i.avPerMPa },
  { header: 'mv (1/MPa)', format: '0.0000', value: (i) => i.mvPerMPa },
  { header: 'cv Taylor (m²/yr)', format: '0.000', value: (i) => i.cvTaylorM2PerYr },
  { header: 'cv Casagrande (m²/yr)', format: '0.000', value: (i) => i.cvCasagrandeM2PerYr },
  { header: 'k (m/s)', format: '0.00E+00', value: (i) => i.hydraulicConductivityMPerS },
  { header: 'k from', value: (i) => i.hydraulicConductivityBasis },
  { header: 'Cα (–)', format: '0.0000', value: (i) => i.secondaryCompressionIndex },
  { header: 'Cα′ (–)', format: '0.00000', value: (i) => i.modifiedSecondaryCompressionIndex },
];

const source = (s: string | undefined) => (s === undefined ? null : s === 'pick' ? 'reviewer' : 'automatic');

const TIME_CURVE_COLUMNS: ExportColumn<Increment>[] = [
  { header: 'Increment', format: '0', value: (i) => i.index },
  { header: 'σ′ (kPa)', format: '0.0', value: (i) => i.stressKpa },
  { header: 'Taylor d0 (mm)', format: '0.0000', value: (i) => i.taylor?.d0Mm ?? null },
  { header: 'Taylor d0 from', value: (i) => source(i.taylor?.d0Source) },
  { header: 'Taylor t90 (min)', format: '0.000', value: (i) => i.taylor?.t90Min ?? null },
  { header: 'Taylor t90 from', value: (i) => source(i.taylor?.t90Source) },
  { header: 'Taylor d90 (mm)', format: '0.0000', value: (i) => i.taylor?.d90Mm ?? null },
  { header: 'Taylor d100 (mm)', format: '0.0000', value: (i) => i.taylor?.d100Mm ?? null },
  { header: 'Taylor Hdr (mm)', format: '0.000', value: (i) => i.taylor?.drainagePathMm ?? null },
  { header: 'Taylor cv (m²/yr)', format: '0.000', value: (i) => i.taylor?.cvM2PerYr ?? null },
  { header: 'Casagrande d0 (mm)', format: '0.0000', value: (i) => i.casagrande?.d0Mm ?? null },
  { header: 'Casagrande d0 from', value: (i) => source(i.casagrande?.d0Source) },
  { header: 'Casagrande t50 (min)', format: '0.000', value: (i) => i.casagrande?.t50Min ?? null },
  { header: 'Casagrande t50 from', value: (i) => source(i.casagrande?.t50Source) },
  { header: 'Casagrande d50 (mm)', format: '0.0000', value: (i) => i.casagrande?.d50Mm ?? null },
  { header: 'Casagrande d100 (mm)', format: '0.0000', value: (i) => i.casagrande?.d100Mm ?? null },
  { header: 'Casagrande d100 from', value: (i) => source(i.casagrande?.d100Source) },
  { header: 'Casagrande t100 (min)', format: '0.000', value: (i) => i.casagrande?.t100Min ?? null },
  { header: 'Casagrande Hdr (mm)', format: '0.000', value: (i) => i.casagrande?.drainagePathMm ?? null },
  { header: 'Casagrande cv (m²/yr)', format: '0.000', value: (i) => i.casagrande?.cvM2PerYr ?? null },
  { header: 'Secondary slope (mm per log cycle)', format: '0.00000', value: (i) => i.casagrande?.secondarySlopeMmPerLogCycle ?? null },
];

/** A test's reduced data: what was tested, the parameters, each increment and each time curve. */
export async function reducedDataWorkbook(record: TestRecord): Promise<{ bytes: Buffer; fileName: string }> {
  const r = record.analysis.result;
  const p = r.preconsolidation;
  const cv = cvRange(r);
  const a = record.approval;
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Porestack';
  workbook.created = new Date();
  addFactsSheet(workbook, 'Test', [
    ['Laboratory', record.organisation.name],
    ['Project', `${record.project.name} (${record.project.reference})`],
    ['Client', record.project.clientName],
    ['Borehole', record.borehole.name],
    ['Sample', record.sample.reference],
    ['Top depth (m)', record.sample.topDepthM, '0.00'],
    ['Bottom depth (m)', record.sample.bottomDepthM, '0.00'],
    ['Description', record.sample.description],
    ['Test', record.test.reference],
    ['Test id', record.test.id],
    ['Method', record.organisation.methodStatement],
    ['Approval', a ? `Version ${a.version}, approved by ${a.approvedByName}` : 'Not an approved version: the test’s current analysis, which may still change.'],
    ['Approved (UTC)', a ? a.approvedAt : null, 'yyyy-mm-dd hh:mm'],
    ['Soil record version id', a?.versionId ?? null],
    ['Analysis id', record.analysis.id],
    ['Inputs hash (SHA-256)', record.analysis.inputsHash],
    ['geo-core version', record.analysis.geoCoreVersion],
    ['Initial height (mm)', r.specimen.initialHeightMm, '0.000'],
    ['Area (mm²)', r.specimen.areaMm2, '0.0'],
    ['Dry mass (g)', r.specimen.dryMassG, '0.00'],
    ['Height of solids (mm)', r.specimen.heightOfSolidsMm, '0.000'],
    ['Drainage', r.specimen.drainage],
    ['e0 (–)', r.initialVoidRatio, '0.000'],
    ['Final void ratio (–)', r.specimen.finalVoidRatio, '0.000'],
    ['Cc (–)', r.compressionIndex, '0.000'],
    ['CR (–)', r.compressionRatio, '0.000'],
    ['Cr (–)', r.recompressionIndex, '0.000'],
    ['RR (–)', r.recompressionRatio, '0.000'],
    ['Cs (–)', r.swellIndex, '0.000'],
    ['σ′p Casagrande (kPa)', p.casagrandeKpa, '0.0'],
    ['σ′p Pacheco Silva (kPa)', p.pachecoSilvaKpa, '0.0'],
    ['σ′p adopted (kPa)', p.adoptedKpa, '0.0'],
    ['σ′p adopted from', p.adoptedFrom],
    ['σ′v0 (kPa)', r.inSituVerticalEffectiveStressKpa, '0.0'],
    ['OCR (–)', r.overconsolidationRatio, '0.00'],
    ['cv min (m²/yr)', cv.min, '0.000'],
    ['cv max (m²/yr)', cv.max, '0.000'],
    ['Cα, median beyond σ′p (–)', representativeSecondaryIndex(r), '0.0000'],
    ['Sample quality Δe/e0 (–)', r.sampleQuality?.voidRatioChangeRatio ?? null, '0.000'],
    ['Sample quality', r.sampleQuality?.category ?? null],
    ['Reason for reviewer’s values', record.analysis.pickReason],
    ['Caution', REPORT_CAUTION],
  ]);
  addTableSheet(workbook, 'Increments', INCREMENT_COLUMNS, r.increments);
  addTableSheet(workbook, 'Time curves', TIME_CURVE_COLUMNS, r.increments);
  addTableSheet(
    workbook,
    'Warnings',
    [
      { header: 'Increment', format: '0', value: (w: (typeof r.warnings)[number]) => w.incrementIndex },
      { header: 'Kind', width: 26, value: (w) => w.code },
      { header: 'Warning', width: 100, value: (w) => w.message },
    ],
    r.warnings,
  );
  const suffix = a ? `v${a.version}` : 'current';
  return { bytes: Buffer.from(await workbook.xlsx.writeBuffer()), fileName: safeReportFileName(`reduced-data-${record.test.reference}-${suffix}.xlsx`) };
}
