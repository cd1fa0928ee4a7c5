import type { CompressibleParametersInput, GroundModelContent, GroundModelContentInput, GroundModelLayer, GroundModelLayerInput, LayerSourceInput } from './ground-model.js';

type ParameterName = NonNullable<CompressibleParametersInput['entered']>[number];

/** The source as the editor sends it: ids only. */
function sourceInput(layer: GroundModelLayer): LayerSourceInput | null {
  const source = layer.source;
  if (source === null) return null;
  if (source.kind === 'record') return { kind: 'record', recordId: source.recordId, versionId: source.versionId };
  if (source.kind === 'set') return { kind: 'set', setId: source.setId, setRevisionId: source.setRevisionId };
  return { kind: 'hand' };
}

/** A stored layer's parameters as input: values typed by hand kept and named in `entered`, the rest left to the source. */
function parametersInput(layer: GroundModelLayer): CompressibleParametersInput | null {
  const p = layer.parameters;
  if (p === null) return null;
  const entered: ParameterName[] = [];
  const hand = (name: ParameterName, resolved: { value: number | null; origin: 'source' | 'hand' }) => {
    if (resolved.origin === 'hand') entered.push(name);
    return resolved.value;
  };
  return {
    e0: hand('e0', p.e0),
    cc: hand('cc', p.cc),
    recompressionIndex: hand('recompressionIndex', p.recompressionIndex),
    recompressionIndexKind: p.recompressionIndex.kind,
    preconsolidationCarry: p.preconsolidationCarry,
    preconsolidationKpa: hand('preconsolidationKpa', p.preconsolidationKpa),
    preconsolidationDepthM: p.preconsolidationKpa.origin === 'hand' ? p.preconsolidationDepthM : null,
    ocr: hand('ocr', p.ocr),
    cvM2PerYr: hand('cvM2PerYr', p.cvM2PerYr),
    cvBasis: p.cvM2PerYr.cvBasis,
    cvFinalStressKpa: p.cvM2PerYr.cvFinalStressKpa,
    cAlpha: hand('cAlpha', p.cAlpha),
    entered: layer.source?.kind === 'hand' ? [] : entered,
  };
}

/**
 * A stored ground model as the input that would save it again: the editor opens a revision
 * this way, and a re-run with newer parameters starts from it with only the sources moved on.
 */
export function groundModelInputFromContent(content: GroundModelContent): GroundModelContentInput & { layers: GroundModelLayerInput[] } {
  return {
    groundLevelM: content.groundLevelM,
    waterTableDepthM: content.waterTableDepthM,
    waterUnitWeightKnPerM3: content.waterUnitWeightKnPerM3,
    layers: content.layers.map((layer) => ({
      name: layer.name,
      kind: layer.kind,
      thicknessM: layer.thicknessM,
      unitWeightKnPerM3: layer.unitWeightKnPerM3,
      saturatedUnitWeightKnPerM3: layer.saturatedUnitWeightKnPerM3,
      elasticModulusKpa: layer.elasticModulusKpa,
      poissonRatio: layer.poissonRatio,
      drainageTop: layer.drainageTop,
      drainageBottom: layer.drainageBottom,
      source: sourceInput(layer),
      parameters: parametersInput(layer),
    })),
  };
}
