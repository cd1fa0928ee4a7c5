import type { LayerSource } from '@porestack/types';

/** Where a layer's values came from, in the words the screen and the workbook use. */
export function sourceLabel(source: LayerSource | null): string {
  if (source === null) return '—';
  if (source.kind === 'record') return `soil record ${source.boreholeName} ${source.sampleReference} at ${source.sampleDepthM.toFixed(2)} m, ${source.testReference} version ${source.version}`;
  if (source.kind === 'set') return `characteristic set ${source.name}, revision ${source.revision}`;
  return 'entered by hand';
}
