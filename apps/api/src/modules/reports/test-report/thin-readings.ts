import type { TimeDeformationReading } from '@porestack/geo-core';

/**
 * At most `limit` readings for a printed time curve, spread evenly on log time (where the
 * constructions are read), keeping the first and the last: a logger's 50,000 readings of one
 * increment would make a page of ink and a slow PDF without showing more.
 */
export function thinReadings(readings: readonly TimeDeformationReading[], limit = 200): TimeDeformationReading[] {
  if (readings.length <= limit) return [...readings];
  const positive = readings.filter((r) => r.elapsedMin > 0);
  const kept = new Set<TimeDeformationReading>(readings.filter((r) => r.elapsedMin <= 0).slice(0, 1));
  const first = positive[0];
  const last = positive[positive.length - 1];
  if (!first || !last) return readings.slice(0, limit);
  const [logStart, logEnd] = [Math.log10(first.elapsedMin), Math.log10(last.elapsedMin)];
  let cursor = 0;
  for (let k = 0; k < limit; k += 1) {
    const target = logStart + ((logEnd - logStart) * k) / (limit - 1);
    while (cursor < positive.length - 1 && Math.log10((positive[cursor] as TimeDeformationReading).elapsedMin) < target) cursor += 1;
    kept.add(positive[cursor] as TimeDeformationReading);
  }
  return readings.filter((r) => kept.has(r));
}
