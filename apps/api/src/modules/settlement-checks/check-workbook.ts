import ExcelJS from 'exceljs';
import { LIMIT_SOURCE_LABELS, type CheckRevision, type FootingSettlementResult, type SublayerSettlementRow } from '@porestack/types';
import { traceSetRevision } from '../characteristic-sets/characteristic-sets.service.js';
import { designVersions } from '../design-records/design-records.service.js';
import { getRevision } from './check-runs.service.js';
import { sourceLabel } from './source-label.js';

type CellValue = string | number | boolean | null;

/** A text that a spreadsheet could take for a formula (=, +, - or @ first) is kept as text. */
const FORMULA_LEAD = /^[=+\-@]/;

function addSheet(workbook: ExcelJS.Workbook, name: string, caution: string, headings: readonly string[], rows: ReadonlyArray<readonly CellValue[]>, numberFormats: Record<number, string> = {}): void {
  const sheet = workbook.addWorksheet(name);
  sheet.addRow([caution]).font = { italic: true, color: { argb: 'FF92400E' } };
  sheet.addRow([]);
  const head = sheet.addRow([...headings]);
  head.font = { bold: true };
  for (const values of rows) {
    const row = sheet.addRow([...values]);
    row.eachCell((cell, column) => {
      if (typeof cell.value === 'string' && FORMULA_LEAD.test(cell.value)) cell.numFmt = '@';
      else if (typeof cell.value === 'number' && numberFormats[column]) cell.numFmt = numberFormats[column]!;
    });
  }
  // Text cells in the heading and caution rows are ours, but a check or footing name is not.
  sheet.getRow(1).eachCell((cell) => {
    if (typeof cell.value === 'string' && FORMULA_LEAD.test(cell.value)) cell.numFmt = '@';
  });
  sheet.columns.forEach((column, index) => {
    column.width = index === 0 ? 22 : 14;
  });
  sheet.views = [{ state: 'frozen', ySplit: 3 }];
}

const mm = (m: number | null) => (m === null ? null : m * 1000);

function sublayerRow(footingId: string, row: SublayerSettlementRow): CellValue[] {
  return [
    footingId,
    row.layerName,
    row.topDepthM,
    row.bottomDepthM,
    row.midDepthM,
    row.thicknessM,
    row.initialEffectiveStressKpa,
    row.preconsolidationKpa,
    row.ownStressIncreaseKpa,
    row.neighboursStressIncreaseKpa,
    row.stressIncreaseKpa,
    row.consolidationCase,
    mm(row.primarySettlementM),
    mm(row.secondarySettlementM),
  ];
}

const SUBLAYER_HEADINGS = ['Footing', 'Layer', 'Top (m)', 'Bottom (m)', 'Mid-depth (m)', 'Thickness (m)', 'σ′v0 (kPa)', 'σ′p (kPa)', 'Δσ own (kPa)', 'Δσ neighbours (kPa)', 'Δσ total (kPa)', 'Case', 'Primary (mm)', 'Secondary (mm)'];

/**
 * A revision as an XLSX workbook: the check and its method, per-footing results, per-sublayer
 * detail, pairs, the ground model as run and where every parameter came from, each sheet headed
 * by the caution. Settlements in mm, stresses in kPa; names that begin like a formula stay text.
 */
export async function checkWorkbook(orgId: string, projectId: string, checkId: string, revisionNumber: number): Promise<{ bytes: Buffer; fileName: string }> {
  const revision: CheckRevision = await getRevision(orgId, projectId, checkId, revisionNumber, 'full');
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Porestack';
  workbook.created = new Date(revision.createdAt);
  const caution = `Caution: ${revision.caution}`;
  const o = revision.options;
  const check = revision.result.check;
  const summary: CellValue[][] = [
    ['Check', revision.checkName],
    ['Revision', revision.revision],
    ['Why it was run', revision.reason],
    ['Run at', revision.createdAt],
    ['Run by', revision.createdBy.name],
    ['geo-core version', revision.geoCoreVersion],
    ['Ground model', `${revision.groundModel.name}, revision ${revision.groundModel.revision}`],
    ['Loading', o.loading === 'uniform' ? `uniform stress increase ${o.uniformStressIncreaseKpa} kPa` : `${revision.footings.length} footings`],
    ['Stress method', o.stressMethod === '2to1' ? '2V:1H' : 'Boussinesq'],
    ['Neighbouring footings', o.includeNeighbours ? 'included' : 'ignored'],
    ['Sublayers', o.sublayerMode === 'count' ? `${o.sublayerCount} per layer` : `at most ${o.sublayerMaxThicknessM} m thick`],
    ['Immediate settlement', o.immediate ? 'included' : 'left out'],
    ['Secondary compression', o.secondary ? `included, design life ${o.designLifeYears} years` : 'left out'],
    ['Total settlement limit (mm)', o.totalSettlementLimitMm],
    ['Total limit from', LIMIT_SOURCE_LABELS[o.totalSettlementSource]],
    ['Angular distortion limit', `1/${o.angularDistortionDenominator}`],
    ['Angular distortion limit from', LIMIT_SOURCE_LABELS[o.angularDistortionSource]],
    ...check.method.notes.map((note): CellValue[] => ['Method', note]),
    ...revision.warnings.map((warning): CellValue[] => ['Warning', warning]),
  ];
  addSheet(workbook, 'Check', caution, ['Item', 'Value'], summary);

  if (revision.result.kind === 'footings') {
    const asRun = new Map(revision.footingsAsRun.map((f) => [f.id, f]));
    const rows = new Map(revision.footings.map((f) => [f.id, f]));
    const footings: FootingSettlementResult[] = revision.result.check.footings;
    addSheet(
      workbook,
      'Footings',
      caution,
      ['Footing', 'Shape', 'B (m)', 'L (m)', 'Depth (m)', 'x (m)', 'y (m)', 'Gross q (kPa)', 'Soil removed (kPa)', 'Net q (kPa)', 'Immediate (mm)', 'Primary (mm)', 'Secondary (mm)', 'Total (mm)', 't50 (years)', 't90 (years)', 'Within total limit'],
      footings.map((f) => [
        f.id,
        rows.get(f.id)?.shape ?? '',
        f.widthM,
        f.lengthM,
        f.depthM,
        f.xM,
        f.yM,
        asRun.get(f.id)?.grossPressureKpa ?? null,
        asRun.get(f.id)?.overburdenKpa ?? null,
        f.pressureKpa,
        mm(f.immediateM),
        mm(f.primaryM),
        mm(f.secondaryM),
        mm(f.totalM),
        f.timeTo50PercentYears,
        f.timeTo90PercentYears,
        f.withinTotalLimit === null ? 'no limit' : f.withinTotalLimit ? 'yes' : 'NO',
      ]),
      { 11: '0.0', 12: '0.0', 13: '0.0', 14: '0.0' },
    );
    addSheet(workbook, 'Sublayers', caution, SUBLAYER_HEADINGS, footings.flatMap((f) => f.sublayers.map((row) => sublayerRow(f.id, row))));
    addSheet(
      workbook,
      'Pairs',
      caution,
      ['Footing A', 'Footing B', 'Distance (m)', 'Differential (mm)', 'Angular distortion', 'As 1/n', 'Within design limit', 'Against the published limits'],
      revision.result.check.pairs.map((p) => [
        p.footingIds[0],
        p.footingIds[1],
        p.distanceM,
        mm(p.differentialSettlementM),
        p.angularDistortion,
        p.angularDistortion > 0 ? `1/${Math.round(1 / p.angularDistortion)}` : '—',
        p.withinDesignLimit ? 'yes' : 'NO',
        p.verdicts.map((v) => v.statement).join(' '),
      ]),
    );
  } else {
    const uniform = revision.result.check;
    addSheet(workbook, 'Result', caution, ['Loading', 'Δσ (kPa)', 'Primary (mm)', 'Secondary (mm)', 'Total (mm)', 't50 (years)', 't90 (years)'], [
      ['uniform load', uniform.method.stressIncreaseKpa, mm(uniform.primaryM), mm(uniform.secondaryM), mm(uniform.totalM), uniform.timeTo50PercentYears, uniform.timeTo90PercentYears],
    ]);
    addSheet(workbook, 'Sublayers', caution, SUBLAYER_HEADINGS, uniform.sublayers.map((row) => sublayerRow('uniform load', row)));
  }

  const layers = revision.groundModel.content.layers;
  const value = (v: { value: number | null; origin: 'source' | 'hand' } | undefined) => v?.value ?? null;
  const origin = (v: { value: number | null; origin: 'source' | 'hand' } | undefined) => (v && v.value !== null && v.origin === 'hand' ? 'entered by hand' : '');
  addSheet(
    workbook,
    'Ground model',
    caution,
    ['Layer', 'Kind', 'Top (m)', 'Bottom (m)', 'γ (kN/m³)', 'γsat (kN/m³)', 'E′ (kPa)', 'ν', 'e0', '', 'Cc', '', 'Cr/Cs', 'Index', '', 'σ′p (kPa)', 'at depth (m)', 'carried by', '', 'OCR', '', 'cv (m²/yr)', 'cv basis', 'Cα', '', 'Source'],
    [
      ['Water table depth (m)', revision.groundModel.content.waterTableDepthM],
      ['γw (kN/m³)', revision.groundModel.content.waterUnitWeightKnPerM3],
      ...layers.map((l): CellValue[] => {
        const p = l.parameters;
        return [
          l.name,
          l.kind,
          l.topDepthM,
          l.bottomDepthM,
          l.unitWeightKnPerM3,
          l.saturatedUnitWeightKnPerM3,
          l.elasticModulusKpa,
          l.poissonRatio,
          value(p?.e0),
          origin(p?.e0),
          value(p?.cc),
          origin(p?.cc),
          value(p?.recompressionIndex),
          p?.recompressionIndex.kind ?? null,
          origin(p?.recompressionIndex),
          value(p?.preconsolidationKpa),
          p?.preconsolidationDepthM ?? null,
          p ? (p.preconsolidationCarry === 'ocr' ? 'OCR' : 'constant σ′p') : null,
          origin(p?.preconsolidationKpa),
          value(p?.ocr),
          origin(p?.ocr),
          value(p?.cvM2PerYr),
          p?.cvM2PerYr.basis ?? null,
          value(p?.cAlpha),
          origin(p?.cAlpha),
          sourceLabel(l.source),
        ];
      }),
    ],
  );

  const versions = await designVersions(orgId, projectId, layers.flatMap((l) => (l.source?.kind === 'record' ? [l.source.versionId] : [])));
  const sources: CellValue[][] = [];
  for (const layer of layers) {
    const source = layer.source;
    if (source?.kind === 'record') {
      const v = versions.get(source.versionId);
      sources.push([layer.name, 'soil record', `${source.boreholeName} ${source.sampleReference}`, v?.depthM ?? source.sampleDepthM, source.version, source.testReference, v?.approvedByName ?? '', v ? v.approvedAt.toISOString() : '', v?.readingsFileName ?? '', v?.readingsSha256 ?? '']);
    } else if (source?.kind === 'set') {
      const trace = await traceSetRevision(orgId, projectId, source.setRevisionId);
      sources.push([layer.name, 'characteristic set', `${trace.name} (revision ${trace.revision})`, null, null, '', trace.createdByName, trace.createdAt, '', '']);
      for (const member of trace.members) {
        sources.push(['', '  member', `${member.boreholeName} ${member.sampleReference}`, member.sampleDepthM, member.version, member.testReference, member.approvedByName, member.approvedAt, member.readingsFileName ?? '', member.readingsSha256 ?? '']);
      }
    } else if (source?.kind === 'hand') {
      sources.push([layer.name, 'entered by hand', '', null, null, '', '', '', '', '']);
    }
  }
  addSheet(workbook, 'Sources', caution, ['Layer', 'From', 'Record or set', 'Sample depth (m)', 'Version', 'Test', 'Approved or saved by', 'At', 'Readings file', 'Readings file SHA-256'], sources);

  const bytes = Buffer.from(await workbook.xlsx.writeBuffer());
  const safeName = revision.checkName.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '') || 'check';
  return { bytes, fileName: `${safeName}-rev${revision.revision}.xlsx` };
}
