/** How the design pages write numbers: settlements in mm, stresses in kPa, parameters to 3 significant figures. */

export function formatMm(metres: number | null | undefined, digits = 1): string {
  return metres === null || metres === undefined ? '—' : (metres * 1000).toFixed(digits);
}

export function formatNumber(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  // Large values (moduli in kPa) read best whole, grouped: 12,000 rather than 1.20e+4.
  if (magnitude >= digits) return Math.round(Number(value.toPrecision(digits))).toLocaleString('en-GB');
  return magnitude < -3 ? value.toPrecision(digits) : value.toFixed(Math.max(0, digits - 1 - magnitude));
}

export function formatFixed(value: number | null | undefined, digits: number): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : value.toFixed(digits);
}

/** "1/480" for an angular distortion. */
export function formatRatio(value: number): string {
  return value > 0 ? `1/${Math.round(1 / value)}` : '0';
}

export function formatYears(years: number | null | undefined): string {
  if (years === null || years === undefined) return '—';
  if (years < 1) return `${(years * 12).toFixed(1)} months`;
  return `${years < 10 ? years.toFixed(1) : years.toFixed(0)} years`;
}
