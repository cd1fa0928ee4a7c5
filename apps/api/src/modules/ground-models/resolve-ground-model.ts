import { CompressibleParametersInputSchema, type GroundModelContentInputSchema, type GroundModelContent, type GroundModelLayer, type ResolvedCompressibleParameters } from '@porestack/types';
import type { z } from 'zod';
import type { FieldIssue } from '../../errors/domain-error.js';
import { setRevisionsByIds, type StoredSetRevision } from '../characteristic-sets/characteristic-sets.service.js';
import { designVersions, type DesignVersion } from '../design-records/design-records.service.js';
import { cvAtDesignRange } from './cv-at-design-range.js';
import { groundModelWarnings } from './ground-model-warnings.js';

type ContentInput = z.output<typeof GroundModelContentInputSchema>;
type LayerInput = ContentInput['layers'][number];
type ParametersInput = NonNullable<LayerInput['parameters']>;
type ParameterName = ParametersInput['entered'][number];

/** A ground model with every value resolved from its source, the versions it pinned, and what is wrong with it. */
export interface ResolvedGroundModel {
  content: GroundModelContent;
  recordVersionIds: string[];
  setRevisionIds: string[];
  /** Stop a save: each names its field. */
  errors: FieldIssue[];
  /** Need the designer's acknowledgement: each names its field. */
  warnings: FieldIssue[];
}

export const CV_BASIS_LOWEST = 'lowest cv of the test’s loading increments (slowest: cautious for time)';

const layerLabel = (index: number, layer: { name: string }) => `Layer ${index + 1} (${layer.name})`;

/**
 * Resolves each compressible layer's parameters from its source: an approved soil record
 * version of the project, a characteristic set revision of the project, or the designer's
 * own entries. Values the designer typed over a source are marked 'hand'. The server, not the
 * page, reads the source, so what is stored is what was approved.
 */
export async function resolveGroundModel(orgId: string, projectId: string, input: ContentInput): Promise<ResolvedGroundModel> {
  const errors: FieldIssue[] = [];
  const recordIds = input.layers.flatMap((l) => (l.kind === 'compressible' && l.source?.kind === 'record' ? [l.source.versionId] : []));
  const setIds = input.layers.flatMap((l) => (l.kind === 'compressible' && l.source?.kind === 'set' ? [l.source.setRevisionId] : []));
  const versions = await designVersions(orgId, projectId, recordIds);
  const sets = await setRevisionsByIds(orgId, projectId, setIds);
  let topDepthM = 0;
  const layers = input.layers.map((layer, index): GroundModelLayer => {
    const path = `layers.${index}`;
    const bottomDepthM = topDepthM + layer.thicknessM;
    const base = {
      name: layer.name,
      kind: layer.kind,
      topDepthM,
      bottomDepthM,
      thicknessM: layer.thicknessM,
      unitWeightKnPerM3: layer.unitWeightKnPerM3,
      saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3,
      elasticModulusKpa: layer.elasticModulusKpa,
      poissonRatio: layer.poissonRatio,
      drainageTop: layer.drainageTop,
      drainageBottom: layer.drainageBottom,
    };
    topDepthM = bottomDepthM;
    if ((layer.elasticModulusKpa === null) !== (layer.poissonRatio === null)) {
      errors.push({ path: `${path}.${layer.elasticModulusKpa === null ? 'elasticModulusKpa' : 'poissonRatio'}`, message: `${layerLabel(index, layer)}: give both E′ and ν for immediate settlement, or neither.` });
    }
    if (layer.saturatedUnitWeightKnPerM3 <= input.waterUnitWeightKnPerM3) {
      errors.push({
        path: `${path}.saturatedUnitWeightKnPerM3`,
        message: `${layerLabel(index, layer)}: the unit weight below the water table (${layer.saturatedUnitWeightKnPerM3} kN/m³) must exceed that of water (${input.waterUnitWeightKnPerM3} kN/m³). Check the value.`,
      });
    }
    if (layer.kind === 'granular') return { ...base, source: null, parameters: null };
    const source = layer.source ?? { kind: 'hand' as const };
    const given = layer.parameters ?? CompressibleParametersInputSchema.parse({});
    if (source.kind === 'record') {
      const version = versions.get(source.versionId);
      if (!version || version.recordId !== source.recordId) {
        errors.push({ path: `${path}.source`, message: `${layerLabel(index, layer)}: that soil record version is not an approved version of this project. Pick the record again from the list.` });
        return { ...base, source: { kind: 'hand' }, parameters: handParameters(given, (base.topDepthM + bottomDepthM) / 2) };
      }
      return {
        ...base,
        source: {
          kind: 'record',
          recordId: version.recordId,
          versionId: version.versionId,
          version: version.version,
          testId: version.testId,
          testReference: version.testReference,
          boreholeName: version.boreholeName,
          sampleReference: version.sampleReference,
          sampleDepthM: version.depthM,
        },
        parameters: fromRecord(version, given),
      };
    }
    if (source.kind === 'set') {
      const set = sets.get(source.setRevisionId);
      if (!set || set.setId !== source.setId) {
        errors.push({ path: `${path}.source`, message: `${layerLabel(index, layer)}: that characteristic set is not one of this project. Pick the set again.` });
        return { ...base, source: { kind: 'hand' }, parameters: handParameters(given, (base.topDepthM + bottomDepthM) / 2) };
      }
      return { ...base, source: { kind: 'set', setId: set.setId, setRevisionId: set.id, revision: set.revision, name: set.name }, parameters: fromSet(set, given) };
    }
    return { ...base, source: { kind: 'hand' }, parameters: handParameters(given, (base.topDepthM + bottomDepthM) / 2) };
  });
  const content: GroundModelContent = { groundLevelM: input.groundLevelM, waterTableDepthM: input.waterTableDepthM, waterUnitWeightKnPerM3: input.waterUnitWeightKnPerM3, layers };
  if (input.waterTableDepthM <= topDepthM) errors.push(...(await cvAtDesignRange(orgId, content, versions)));
  errors.push(...missingParameters(content));
  if (input.waterTableDepthM > topDepthM) {
    errors.push({
      path: 'waterTableDepthM',
      message: `The water table (${input.waterTableDepthM} m) is below the bottom of the profile (${topDepthM} m). Add the layer it lies in, or correct its depth.`,
    });
  }
  return {
    content,
    recordVersionIds: [...new Set(recordIds.filter((id) => versions.has(id)))],
    setRevisionIds: [...new Set(setIds.filter((id) => sets.has(id)))],
    errors,
    warnings: groundModelWarnings(content),
  };
}

/** A compressible layer needs at least e0 and Cc, and a recompression index wherever σ′p or OCR is given. */
function missingParameters(content: GroundModelContent): FieldIssue[] {
  return content.layers.flatMap((layer, index) => {
    const p = layer.parameters;
    if (layer.kind !== 'compressible' || p === null) return [];
    const issues: FieldIssue[] = [];
    if (p.e0.value === null || p.cc.value === null) {
      const missing = [p.e0.value === null ? 'e0' : null, p.cc.value === null ? 'Cc' : null].filter(Boolean).join(' and ');
      issues.push({
        path: `layers.${index}.parameters`,
        message: `${layerLabel(index, layer)} is compressible but has no ${missing}. Pick an approved soil record or a characteristic set for it, or enter the values by hand.`,
      });
    }
    const overconsolidated = p.preconsolidationKpa.value !== null || (p.ocr.value !== null && p.ocr.value > 1);
    if (overconsolidated && p.recompressionIndex.value === null) {
      issues.push({
        path: `layers.${index}.parameters.recompressionIndex`,
        message: `${layerLabel(index, layer)}: σ′p or an OCR above 1 is given, so the recompression index (Cr or Cs) is needed too. Enter it, or clear σ′p to treat the layer as normally consolidated.`,
      });
    }
    return issues;
  });
}

function value(source: number | null, given: ParametersInput, name: ParameterName, entered: number | null) {
  return given.entered.includes(name) ? { value: entered, origin: 'hand' as const } : { value: source, origin: 'source' as const };
}

function fromRecord(v: DesignVersion, given: ParametersInput): ResolvedCompressibleParameters {
  const kind = given.recompressionIndexKind ?? (v.cr !== null ? 'Cr' : 'Cs');
  const recompression = value(kind === 'Cr' ? v.cr : v.cs, given, 'recompressionIndex', given.recompressionIndex);
  return {
    e0: value(v.e0, given, 'e0', given.e0),
    cc: value(v.cc, given, 'cc', given.cc),
    recompressionIndex: { ...recompression, kind: recompression.origin === 'hand' ? (given.recompressionIndexKind ?? null) : kind },
    preconsolidationCarry: given.preconsolidationCarry,
    preconsolidationKpa: value(v.preconsolidationKpa, given, 'preconsolidationKpa', given.preconsolidationKpa),
    preconsolidationDepthM: given.entered.includes('preconsolidationKpa') ? (given.preconsolidationDepthM ?? v.depthM) : v.depthM,
    ocr: given.entered.includes('ocr') ? { value: given.ocr, origin: 'hand' } : { value: null, origin: 'source' },
    cvM2PerYr: {
      ...value(v.cvMinM2PerYr, given, 'cvM2PerYr', given.cvM2PerYr),
      basis: given.entered.includes('cvM2PerYr') ? 'entered by hand' : CV_BASIS_LOWEST,
      cvBasis: given.cvBasis,
      cvFinalStressKpa: given.cvFinalStressKpa,
    },
    cAlpha: value(v.cAlpha, given, 'cAlpha', given.cAlpha),
  };
}

function fromSet(set: StoredSetRevision, given: ParametersInput): ResolvedCompressibleParameters {
  const adopted = (name: keyof StoredSetRevision['adopted']) => set.adopted[name]?.value ?? null;
  const kind = given.recompressionIndexKind ?? (adopted('cr') !== null ? 'Cr' : 'Cs');
  const recompression = value(adopted(kind === 'Cr' ? 'cr' : 'cs'), given, 'recompressionIndex', given.recompressionIndex);
  return {
    e0: value(adopted('e0'), given, 'e0', given.e0),
    cc: value(adopted('cc'), given, 'cc', given.cc),
    recompressionIndex: { ...recompression, kind: recompression.origin === 'hand' ? (given.recompressionIndexKind ?? null) : kind },
    // A set characterises OCR (σ′p itself varies with depth), so σ′p is carried by it.
    preconsolidationCarry: given.entered.includes('preconsolidationKpa') ? given.preconsolidationCarry : 'ocr',
    preconsolidationKpa: given.entered.includes('preconsolidationKpa') ? { value: given.preconsolidationKpa, origin: 'hand' } : { value: null, origin: 'source' },
    preconsolidationDepthM: given.entered.includes('preconsolidationKpa') ? given.preconsolidationDepthM : null,
    ocr: value(adopted('ocr'), given, 'ocr', given.ocr),
    cvM2PerYr: {
      ...value(adopted('cvM2PerYr'), given, 'cvM2PerYr', given.cvM2PerYr),
      basis: given.entered.includes('cvM2PerYr') ? 'entered by hand' : 'adopted in the characteristic set',
      cvBasis: 'lowest',
      cvFinalStressKpa: null,
    },
    cAlpha: value(adopted('cAlpha'), given, 'cAlpha', given.cAlpha),
  };
}

function handParameters(given: ParametersInput, midDepthM: number): ResolvedCompressibleParameters {
  const hand = (v: number | null | undefined) => ({ value: v ?? null, origin: 'hand' as const });
  return {
    e0: hand(given.e0),
    cc: hand(given.cc),
    recompressionIndex: { ...hand(given.recompressionIndex), kind: given.recompressionIndexKind ?? null },
    preconsolidationCarry: given.preconsolidationCarry ?? 'ocr',
    preconsolidationKpa: hand(given.preconsolidationKpa),
    preconsolidationDepthM: given.preconsolidationKpa === null || given.preconsolidationKpa === undefined ? null : (given.preconsolidationDepthM ?? midDepthM),
    ocr: hand(given.ocr),
    cvM2PerYr: { ...hand(given.cvM2PerYr), basis: 'entered by hand', cvBasis: 'lowest', cvFinalStressKpa: null },
    cAlpha: hand(given.cAlpha),
  };
}
