/** A number for a results table, or an em dash when there is none (never NaN). */
export function fixed(value: number | null | undefined, digits: number): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : value.toFixed(digits);
}

/** "0.8 – 2.4" for a range of cv, or a single value when both ends agree, or an em dash. */
export function range(min: number | null, max: number | null, digits: number): string {
  if (min === null || max === null) return '—';
  const low = min.toFixed(digits);
  const high = max.toFixed(digits);
  return low === high ? low : `${low} – ${high}`;
}

/** Depth of a sample: "3.00–3.45 m". */
export function depthRange(topM: number, bottomM: number): string {
  return `${topM.toFixed(2)}–${bottomM.toFixed(2)} m`;
}
