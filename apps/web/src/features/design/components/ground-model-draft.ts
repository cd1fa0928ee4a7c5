import { groundModelInputFromContent, type CompressibleParametersInput, type GroundModelContent, type GroundModelCreate, type GroundModelLayerInput } from '@porestack/types';
import { numberOrNull } from '../../../lib/form-numbers';

/** The parameters a compressible layer takes from its source, in the order the editor shows them. */
export const PARAMETER_NAMES = ['e0', 'cc', 'recompressionIndex', 'preconsolidationKpa', 'ocr', 'cvM2PerYr', 'cAlpha'] as const;
export type ParameterName = (typeof PARAMETER_NAMES)[number];

export const PARAMETER_LABELS: Record<ParameterName, string> = {
  e0: 'e0',
  cc: 'Cc',
  recompressionIndex: 'Cr or Cs',
  preconsolidationKpa: 'σ′p (kPa)',
  ocr: 'OCR',
  cvM2PerYr: 'cv (m²/yr)',
  cAlpha: 'Cα',
};

/** One layer as the form holds it: numbers as typed text, so a half-typed value is not lost. */
export interface LayerDraft {
  key: string;
  name: string;
  kind: 'granular' | 'compressible';
  thicknessM: string;
  unitWeightKnPerM3: string;
  saturatedUnitWeightKnPerM3: string;
  elasticModulusKpa: string;
  poissonRatio: string;
  drainageTop: 'free' | 'impermeable';
  drainageBottom: 'free' | 'impermeable';
  sourceKind: 'record' | 'set' | 'hand';
  recordId: string;
  versionId: string;
  setId: string;
  setRevisionId: string;
  recompressionIndexKind: '' | 'Cr' | 'Cs';
  preconsolidationCarry: 'ocr' | 'pop' | 'constant';
  cvBasis: 'lowest' | 'design-range';
  cvFinalStressKpa: string;
  preconsolidationDepthM: string;
  values: Record<ParameterName, string>;
  /** Values typed over the source's (ignored for a hand source). */
  entered: ParameterName[];
}

export interface ModelDraft {
  name: string;
  note: string;
  groundLevelM: string;
  waterTableDepthM: string;
  waterUnitWeightKnPerM3: string;
  layers: LayerDraft[];
}

let nextKey = 0;
const key = () => `layer-${(nextKey += 1)}`;
const text = (value: number | null | undefined) => (value === null || value === undefined ? '' : String(value));

export function emptyLayer(kind: LayerDraft['kind']): LayerDraft {
  return {
    key: key(),
    name: '',
    kind,
    thicknessM: '',
    unitWeightKnPerM3: '',
    saturatedUnitWeightKnPerM3: '',
    elasticModulusKpa: '',
    poissonRatio: '',
    drainageTop: 'free',
    drainageBottom: 'free',
    sourceKind: 'record',
    recordId: '',
    versionId: '',
    setId: '',
    setRevisionId: '',
    recompressionIndexKind: '',
    preconsolidationCarry: 'ocr',
    cvBasis: 'lowest',
    cvFinalStressKpa: '',
    preconsolidationDepthM: '',
    values: { e0: '', cc: '', recompressionIndex: '', preconsolidationKpa: '', ocr: '', cvM2PerYr: '', cAlpha: '' },
    entered: [],
  };
}

export function emptyModel(): ModelDraft {
  return { name: '', note: '', groundLevelM: '0', waterTableDepthM: '', waterUnitWeightKnPerM3: '9.81', layers: [emptyLayer('granular'), emptyLayer('compressible')] };
}

/** A saved revision as a draft to edit. */
export function draftFromContent(content: GroundModelContent, name: string): ModelDraft {
  const input = groundModelInputFromContent(content);
  return {
    name,
    note: '',
    groundLevelM: text(input.groundLevelM),
    waterTableDepthM: text(input.waterTableDepthM),
    waterUnitWeightKnPerM3: text(input.waterUnitWeightKnPerM3),
    layers: input.layers.map((layer): LayerDraft => {
      const p = layer.parameters;
      const source = layer.source;
      return {
        ...emptyLayer(layer.kind),
        name: layer.name,
        thicknessM: text(layer.thicknessM),
        unitWeightKnPerM3: text(layer.unitWeightKnPerM3),
        saturatedUnitWeightKnPerM3: text(layer.saturatedUnitWeightKnPerM3),
        elasticModulusKpa: text(layer.elasticModulusKpa),
        poissonRatio: text(layer.poissonRatio),
        drainageTop: layer.drainageTop ?? 'free',
        drainageBottom: layer.drainageBottom ?? 'free',
        sourceKind: source?.kind ?? 'hand',
        recordId: source?.kind === 'record' ? source.recordId : '',
        versionId: source?.kind === 'record' ? source.versionId : '',
        setId: source?.kind === 'set' ? source.setId : '',
        setRevisionId: source?.kind === 'set' ? source.setRevisionId : '',
        recompressionIndexKind: p?.recompressionIndexKind ?? '',
        preconsolidationCarry: p?.preconsolidationCarry ?? 'ocr',
        cvBasis: p?.cvBasis ?? 'lowest',
        cvFinalStressKpa: text(p?.cvFinalStressKpa),
        preconsolidationDepthM: text(p?.preconsolidationDepthM),
        values: {
          e0: text(p?.e0),
          cc: text(p?.cc),
          recompressionIndex: text(p?.recompressionIndex),
          preconsolidationKpa: text(p?.preconsolidationKpa),
          ocr: text(p?.ocr),
          cvM2PerYr: text(p?.cvM2PerYr),
          cAlpha: text(p?.cAlpha),
        },
        entered: p?.entered ?? [],
      };
    }),
  };
}

/** Numbers stay text when unreadable, so the shared schema's message names the field. */
const num = (value: string) => numberOrNull(value) as number | null;

function parametersInput(layer: LayerDraft): CompressibleParametersInput {
  const hand = layer.sourceKind === 'hand';
  const value = (name: ParameterName) => (hand || layer.entered.includes(name) ? num(layer.values[name]) : null);
  return {
    e0: value('e0'),
    cc: value('cc'),
    recompressionIndex: value('recompressionIndex'),
    recompressionIndexKind: layer.recompressionIndexKind === '' ? null : layer.recompressionIndexKind,
    preconsolidationCarry: layer.preconsolidationCarry,
    preconsolidationKpa: value('preconsolidationKpa'),
    preconsolidationDepthM: hand || layer.entered.includes('preconsolidationKpa') ? num(layer.preconsolidationDepthM) : null,
    ocr: value('ocr'),
    cvM2PerYr: value('cvM2PerYr'),
    cvBasis: layer.cvBasis,
    cvFinalStressKpa: num(layer.cvFinalStressKpa),
    cAlpha: value('cAlpha'),
    entered: hand ? [] : layer.entered,
  };
}

function layerInput(layer: LayerDraft): GroundModelLayerInput {
  const base: GroundModelLayerInput = {
    name: layer.name,
    kind: layer.kind,
    thicknessM: num(layer.thicknessM) as number,
    unitWeightKnPerM3: num(layer.unitWeightKnPerM3) as number,
    saturatedUnitWeightKnPerM3: num(layer.saturatedUnitWeightKnPerM3) as number,
    elasticModulusKpa: num(layer.elasticModulusKpa),
    poissonRatio: num(layer.poissonRatio),
    drainageTop: layer.drainageTop,
    drainageBottom: layer.drainageBottom,
  };
  if (layer.kind === 'granular') return base;
  const source =
    layer.sourceKind === 'record' && layer.versionId !== ''
      ? { kind: 'record' as const, recordId: layer.recordId, versionId: layer.versionId }
      : layer.sourceKind === 'set' && layer.setRevisionId !== ''
        ? { kind: 'set' as const, setId: layer.setId, setRevisionId: layer.setRevisionId }
        : { kind: 'hand' as const };
  return { ...base, source, parameters: source.kind === 'hand' ? parametersInput({ ...layer, sourceKind: 'hand' }) : parametersInput(layer) };
}

/** The draft as the API takes it (unreadable numbers are left for the schema to name). */
export function modelInput(draft: ModelDraft): GroundModelCreate {
  return {
    name: draft.name,
    note: draft.note,
    groundLevelM: (num(draft.groundLevelM) ?? 0) as number,
    waterTableDepthM: num(draft.waterTableDepthM) as number,
    waterUnitWeightKnPerM3: (num(draft.waterUnitWeightKnPerM3) ?? 9.81) as number,
    layers: draft.layers.map(layerInput),
  };
}
