import type { Freshness, GroundModelContent, SourceChange } from '@porestack/types';
import { currentSetRevisions, setRevisionsByIds } from '../characteristic-sets/characteristic-sets.service.js';
import { currentDesignVersions, designVersions, type DesignVersion } from '../design-records/design-records.service.js';

/** A run's pinned sources: its project and the ground model revision content it used. */
export interface PinnedRun {
  key: string;
  projectId: string;
  content: GroundModelContent;
}

const RECORD_PARAMETERS: Array<{ name: string; of: (v: DesignVersion) => number | null }> = [
  { name: 'e0', of: (v) => v.e0 },
  { name: 'Cc', of: (v) => v.cc },
  { name: 'Cr', of: (v) => v.cr },
  { name: 'Cs', of: (v) => v.cs },
  { name: 'σ′p (kPa)', of: (v) => v.preconsolidationKpa },
  { name: 'cv, lowest (m²/yr)', of: (v) => v.cvMinM2PerYr },
  { name: 'Cα', of: (v) => v.cAlpha },
];

const SET_PARAMETERS: Array<{ name: string; key: 'e0' | 'cc' | 'cr' | 'cs' | 'ocr' | 'cvM2PerYr' | 'cAlpha' }> = [
  { name: 'e0', key: 'e0' },
  { name: 'Cc', key: 'cc' },
  { name: 'Cr', key: 'cr' },
  { name: 'Cs', key: 'cs' },
  { name: 'OCR', key: 'ocr' },
  { name: 'cv (m²/yr)', key: 'cvM2PerYr' },
  { name: 'Cα', key: 'cAlpha' },
];

const differs = (a: number | null, b: number | null) => (a === null || b === null ? a !== b : Math.abs(a - b) > 1e-12 * Math.max(1, Math.abs(a)));

/**
 * "Newer parameters approved": for each run, the soil record versions and characteristic set
 * revisions its ground model took values from that have since been superseded, with the
 * parameters that differ between the pinned and the newest one.
 */
export async function freshnessOf(orgId: string, runs: readonly PinnedRun[]): Promise<Map<string, Freshness>> {
  const byProject = new Map<string, PinnedRun[]>();
  for (const run of runs) byProject.set(run.projectId, [...(byProject.get(run.projectId) ?? []), run]);
  const answers = new Map<string, Freshness>();
  for (const [projectId, projectRuns] of byProject) {
    const layers = projectRuns.flatMap((run) => run.content.layers.map((layer, layerIndex) => ({ run, layer, layerIndex })));
    const recordSources = layers.flatMap(({ layer }) => (layer.source?.kind === 'record' ? [layer.source] : []));
    const setSources = layers.flatMap(({ layer }) => (layer.source?.kind === 'set' ? [layer.source] : []));
    const pinned = await designVersions(orgId, projectId, recordSources.map((s) => s.versionId));
    const current = await currentDesignVersions(orgId, projectId, recordSources.map((s) => s.recordId));
    const currentSets = await currentSetRevisions(orgId, setSources.map((s) => s.setId));
    const newerSets = await setRevisionsByIds(orgId, projectId, [...currentSets.values()].map((s) => s.id));
    for (const run of projectRuns) {
      const changes: SourceChange[] = [];
      run.content.layers.forEach((layer, layerIndex) => {
        const source = layer.source;
        if (source?.kind === 'record') {
          const now = current.get(source.recordId);
          const then = pinned.get(source.versionId);
          if (!now || !then || now.version <= source.version) return;
          changes.push({
            layerIndex,
            layerName: layer.name,
            kind: 'record',
            label: `${source.boreholeName} ${source.sampleReference} (${source.testReference})`,
            pinned: source.version,
            current: now.version,
            parameters: RECORD_PARAMETERS.filter((p) => differs(p.of(then), p.of(now))).map((p) => ({ name: p.name, before: p.of(then), after: p.of(now) })),
          });
        } else if (source?.kind === 'set') {
          const head = currentSets.get(source.setId);
          if (!head || head.revision <= source.revision) return;
          const newer = newerSets.get(head.id);
          changes.push({
            layerIndex,
            layerName: layer.name,
            kind: 'set',
            label: `characteristic set ${source.name}`,
            pinned: source.revision,
            current: head.revision,
            parameters: SET_PARAMETERS.filter((p) => usedFromSet(layer, p.key))
              .map((p) => ({ name: p.name, before: adoptedInContent(layer, p.key), after: newer?.adopted[p.key]?.value ?? null }))
              .filter((p) => differs(p.before, p.after)),
          });
        }
      });
      answers.set(run.key, { newerParametersApproved: changes.length > 0, changes });
    }
  }
  return answers;
}

/** Whether the layer took this parameter from its set (not typed over it, and the index kind it uses). */
function usedFromSet(layer: GroundModelContent['layers'][number], key: (typeof SET_PARAMETERS)[number]['key']): boolean {
  const p = layer.parameters;
  if (!p) return false;
  if (key === 'cr' || key === 'cs') return p.recompressionIndex.origin === 'source' && p.recompressionIndex.kind === (key === 'cr' ? 'Cr' : 'Cs');
  const origin = { e0: p.e0, cc: p.cc, ocr: p.ocr, cvM2PerYr: p.cvM2PerYr, cAlpha: p.cAlpha }[key].origin;
  return origin === 'source';
}

/** The value a set-sourced layer took for one of the set's parameters, as stored in the run's ground model. */
function adoptedInContent(layer: GroundModelContent['layers'][number], key: (typeof SET_PARAMETERS)[number]['key']): number | null {
  const p = layer.parameters;
  if (!p) return null;
  switch (key) {
    case 'e0':
      return p.e0.value;
    case 'cc':
      return p.cc.value;
    case 'cr':
      return p.recompressionIndex.kind === 'Cr' ? p.recompressionIndex.value : null;
    case 'cs':
      return p.recompressionIndex.kind === 'Cs' ? p.recompressionIndex.value : null;
    case 'ocr':
      return p.ocr.value;
    case 'cvM2PerYr':
      return p.cvM2PerYr.value;
    case 'cAlpha':
      return p.cAlpha.value;
  }
}
