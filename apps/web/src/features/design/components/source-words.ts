import type { LayerSource } from '@porestack/types';

/** Where a layer's values came from, as the pages say it. */
export function sourceWords(source: LayerSource | null): string {
  if (source === null) return '—';
  if (source.kind === 'record') return `${source.boreholeName} ${source.sampleReference} at ${source.sampleDepthM.toFixed(2)} m (${source.testReference} v${source.version})`;
  if (source.kind === 'set') return `set “${source.name}”, revision ${source.revision}`;
  return 'entered by hand';
}
