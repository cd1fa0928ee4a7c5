/** A tick on an axis: where it sits (data units) and its label, empty for a minor tick. */
export interface Tick {
  value: number;
  label: string;
}

/** Compact numbers for axis labels: 0.001 → "0.001", 1200 → "1200", 1e-9 → "1×10⁻⁹". */
export function tickLabel(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) return String(Number(value.toPrecision(6)));
  const exponent = Math.floor(Math.log10(magnitude));
  const mantissa = Number((value / 10 ** exponent).toPrecision(3));
  return `${mantissa === 1 ? '' : `${mantissa}×`}10${superscript(exponent)}`;
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

function superscript(n: number): string {
  return String(n)
    .split('')
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join('');
}

/** A "nice" step (1, 2 or 5 × 10ⁿ) giving about `count` intervals over the span. */
function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / power;
  return (fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10) * power;
}

/** The range widened to whole steps, and the ticks on it. */
export function linearTicks(min: number, max: number, count = 5): { min: number; max: number; ticks: Tick[] } {
  if (max <= min) {
    const pad = Math.abs(min) * 0.1 || 1;
    return linearTicks(min - pad, max + pad, count);
  }
  const step = niceStep(max - min, count);
  const low = Math.floor(min / step) * step;
  const high = Math.ceil(max / step) * step;
  const ticks: Tick[] = [];
  for (let v = low; v <= high + step / 2; v += step) {
    const value = Number(v.toPrecision(12));
    ticks.push({ value, label: tickLabel(value) });
  }
  return { min: low, max: high, ticks };
}

/**
 * Whole decades around the range; labels on each decade (and on 2 and 5 when the axis spans
 * two decades or less, so a short axis still reads), unlabelled minor ticks on 2…9.
 */
export function logTicks(min: number, max: number): { min: number; max: number; ticks: Tick[] } {
  const low = Math.floor(Math.log10(min));
  const high = Math.max(Math.ceil(Math.log10(max)), low + 1);
  const ticks: Tick[] = [];
  const labelTwoAndFive = high - low <= 2;
  for (let decade = low; decade <= high; decade += 1) {
    for (let m = 1; m <= 9; m += 1) {
      if (decade === high && m > 1) break;
      const value = Number((m * 10 ** decade).toPrecision(12));
      const labelled = m === 1 || (labelTwoAndFive && (m === 2 || m === 5));
      ticks.push({ value, label: labelled ? tickLabel(value) : '' });
    }
  }
  return { min: 10 ** low, max: 10 ** high, ticks };
}
