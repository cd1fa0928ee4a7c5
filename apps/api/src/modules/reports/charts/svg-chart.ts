import { escapeHtml } from '../pdf/html.js';
import { linearTicks, logTicks, type Tick } from './axis-ticks.js';

/**
 * Vector charts for printed reports, drawn as SVG on the server. Every series differs from
 * the others by its dash pattern and marker shape as well as its colour, so a report printed
 * in black and white still tells the constructions apart.
 */
export type Dash = 'solid' | 'dash' | 'dot' | 'dash-dot' | 'dash-dot-dot' | 'long-dash';
export type MarkerShape = 'circle' | 'circle-open' | 'square' | 'square-open' | 'diamond' | 'diamond-open' | 'triangle-open' | 'cross';

export interface ChartPoint {
  x: number;
  y: number;
}

export interface ChartSeries {
  name: string;
  points: readonly ChartPoint[];
  colour: string;
  /** No line when absent: markers only. */
  line?: { dash: Dash; widthPx?: number };
  marker?: { shape: MarkerShape; sizePx?: number };
  /** Left out of the legend (a part of a construction already named by another series). */
  hideInLegend?: boolean;
}

export interface ChartAxis {
  title: string;
  scale: 'linear' | 'log';
  /** Values grow downwards (deformation, strain). */
  reversed?: boolean;
}

export interface ChartLabel {
  x: number;
  y: number;
  text: string;
  anchor?: 'start' | 'end';
}

export interface ChartSpec {
  /** What the drawing shows, for screen readers and the PDF's structure. */
  description: string;
  widthPx: number;
  heightPx: number;
  x: ChartAxis;
  y: ChartAxis;
  series: readonly ChartSeries[];
  labels?: readonly ChartLabel[];
  /** Columns of the legend below the plot. */
  legendColumns?: number;
}

const DASHES: Record<Dash, string> = { solid: '', dash: '6 3', dot: '1.5 2.5', 'dash-dot': '7 3 1.5 3', 'dash-dot-dot': '8 2.5 1.5 2.5 1.5 2.5', 'long-dash': '11 4' };
const FONT = 'font-family="IBM Plex Sans, DejaVu Sans, sans-serif"';
let chartCount = 0;
const fmt = (n: number) => (Math.round(n * 100) / 100).toString();

interface Scale {
  toPx: (value: number) => number;
  ticks: Tick[];
}

function finitePoints(series: readonly ChartSeries[], axis: 'x' | 'y', log: boolean): number[] {
  return series.flatMap((s) => s.points.map((p) => p[axis])).filter((v) => Number.isFinite(v) && (!log || v > 0));
}

function scaleFor(axis: ChartAxis, values: number[], fromPx: number, toPx: number): Scale {
  const log = axis.scale === 'log';
  const low = values.length ? Math.min(...values) : log ? 1 : 0;
  const high = values.length ? Math.max(...values) : log ? 10 : 1;
  const range = log ? logTicks(low, high) : linearTicks(low, high);
  const [start, end] = axis.reversed ? [toPx, fromPx] : [fromPx, toPx];
  const t = log
    ? (v: number) => (Math.log10(v) - Math.log10(range.min)) / (Math.log10(range.max) - Math.log10(range.min))
    : (v: number) => (v - range.min) / (range.max - range.min);
  return { toPx: (v) => start + t(v) * (end - start), ticks: range.ticks };
}

function marker(shape: MarkerShape, x: number, y: number, size: number, colour: string): string {
  const r = size / 2;
  const filled = !shape.endsWith('-open') && shape !== 'cross';
  const paint = filled ? `fill="${colour}" stroke="${colour}"` : `fill="#ffffff" stroke="${colour}"`;
  switch (shape) {
    case 'circle':
    case 'circle-open':
      return `<circle cx="${fmt(x)}" cy="${fmt(y)}" r="${fmt(r)}" ${paint} stroke-width="1"/>`;
    case 'square':
    case 'square-open':
      return `<rect x="${fmt(x - r)}" y="${fmt(y - r)}" width="${fmt(size)}" height="${fmt(size)}" ${paint} stroke-width="1"/>`;
    case 'diamond':
    case 'diamond-open':
      return `<path d="M${fmt(x)} ${fmt(y - r * 1.3)}L${fmt(x + r * 1.3)} ${fmt(y)}L${fmt(x)} ${fmt(y + r * 1.3)}L${fmt(x - r * 1.3)} ${fmt(y)}Z" ${paint} stroke-width="1"/>`;
    case 'triangle-open':
      return `<path d="M${fmt(x)} ${fmt(y - r * 1.2)}L${fmt(x + r * 1.1)} ${fmt(y + r * 0.8)}L${fmt(x - r * 1.1)} ${fmt(y + r * 0.8)}Z" ${paint} stroke-width="1"/>`;
    case 'cross':
      return `<path d="M${fmt(x - r)} ${fmt(y - r)}L${fmt(x + r)} ${fmt(y + r)}M${fmt(x - r)} ${fmt(y + r)}L${fmt(x + r)} ${fmt(y - r)}" stroke="${colour}" stroke-width="1.3" fill="none"/>`;
  }
}

function seriesMarkup(s: ChartSeries, xs: Scale, ys: Scale, xLog: boolean, yLog: boolean): string {
  const usable = s.points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y) && (!xLog || p.x > 0) && (!yLog || p.y > 0));
  const px = usable.map((p) => ({ x: xs.toPx(p.x), y: ys.toPx(p.y) }));
  let out = '';
  if (s.line && px.length > 1) {
    const d = px.map((p, i) => `${i === 0 ? 'M' : 'L'}${fmt(p.x)} ${fmt(p.y)}`).join('');
    const dash = DASHES[s.line.dash];
    out += `<path d="${d}" fill="none" stroke="${s.colour}" stroke-width="${s.line.widthPx ?? 1.2}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
  }
  if (s.marker) {
    const { shape, sizePx = 5 } = s.marker;
    out += px.map((p) => marker(shape, p.x, p.y, sizePx, s.colour)).join('');
  }
  return out;
}

function legendSample(s: ChartSeries, x: number, y: number): string {
  let out = '';
  if (s.line) {
    const dash = DASHES[s.line.dash];
    out += `<line x1="${fmt(x)}" y1="${fmt(y)}" x2="${fmt(x + 26)}" y2="${fmt(y)}" stroke="${s.colour}" stroke-width="${s.line.widthPx ?? 1.2}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
  }
  if (s.marker) out += marker(s.marker.shape, x + 13, y, s.marker.sizePx ?? 5, s.colour);
  return out;
}

/** The chart as an SVG element sized to its container's width. */
export function renderChart(spec: ChartSpec): string {
  const columns = spec.legendColumns ?? 2;
  const legendItems = spec.series.filter((s) => !s.hideInLegend && s.points.length > 0);
  const legendRows = Math.ceil(legendItems.length / columns);
  const legendHeight = legendRows * 15 + (legendRows ? 6 : 0);
  const plot = { left: 62, right: spec.widthPx - 14, top: 10, bottom: spec.heightPx - 40 - legendHeight };
  const xLog = spec.x.scale === 'log';
  const yLog = spec.y.scale === 'log';
  const xs = scaleFor(spec.x, finitePoints(spec.series, 'x', xLog), plot.left, plot.right);
  const ys = scaleFor(spec.y, finitePoints(spec.series, 'y', yLog), plot.bottom, plot.top);
  chartCount += 1;
  const clipId = `plot-area-${chartCount}`;
  const parts: string[] = [];
  parts.push(`<defs><clipPath id="${clipId}"><rect x="${plot.left}" y="${plot.top}" width="${plot.right - plot.left}" height="${plot.bottom - plot.top}"/></clipPath></defs>`);
  // Grid first, light enough to print grey under the data.
  for (const tick of xs.ticks) {
    const x = fmt(xs.toPx(tick.value));
    parts.push(`<line x1="${x}" y1="${plot.top}" x2="${x}" y2="${plot.bottom}" stroke="${tick.label ? '#c8ccd2' : '#e6e8eb'}" stroke-width="0.6"/>`);
    if (tick.label) parts.push(`<text x="${x}" y="${plot.bottom + 13}" text-anchor="middle" font-size="9" ${FONT} fill="#1f2937">${escapeHtml(tick.label)}</text>`);
  }
  for (const tick of ys.ticks) {
    const y = fmt(ys.toPx(tick.value));
    parts.push(`<line x1="${plot.left}" y1="${y}" x2="${plot.right}" y2="${y}" stroke="${tick.label ? '#c8ccd2' : '#e6e8eb'}" stroke-width="0.6"/>`);
    if (tick.label) parts.push(`<text x="${plot.left - 5}" y="${fmt(Number(y) + 3)}" text-anchor="end" font-size="9" ${FONT} fill="#1f2937">${escapeHtml(tick.label)}</text>`);
  }
  parts.push(`<rect x="${plot.left}" y="${plot.top}" width="${plot.right - plot.left}" height="${plot.bottom - plot.top}" fill="none" stroke="#111827" stroke-width="0.8"/>`);
  parts.push(`<g clip-path="url(#${clipId})">${spec.series.map((s) => seriesMarkup(s, xs, ys, xLog, yLog)).join('')}</g>`);
  for (const label of spec.labels ?? []) {
    if (!Number.isFinite(label.x) || !Number.isFinite(label.y)) continue;
    parts.push(
      `<text x="${fmt(xs.toPx(label.x) + (label.anchor === 'end' ? -6 : 6))}" y="${fmt(ys.toPx(label.y) - 5)}" text-anchor="${label.anchor ?? 'start'}" font-size="9" ${FONT} fill="#111827">${escapeHtml(label.text)}</text>`,
    );
  }
  parts.push(`<text x="${fmt((plot.left + plot.right) / 2)}" y="${plot.bottom + 28}" text-anchor="middle" font-size="10" ${FONT} fill="#111827">${escapeHtml(spec.x.title)}</text>`);
  parts.push(
    `<text transform="translate(14 ${fmt((plot.top + plot.bottom) / 2)}) rotate(-90)" text-anchor="middle" font-size="10" ${FONT} fill="#111827">${escapeHtml(spec.y.title)}</text>`,
  );
  const columnWidth = (plot.right - plot.left) / columns;
  legendItems.forEach((s, i) => {
    const x = plot.left + (i % columns) * columnWidth;
    const y = plot.bottom + 44 + Math.floor(i / columns) * 15;
    parts.push(legendSample(s, x, y));
    parts.push(`<text x="${fmt(x + 32)}" y="${fmt(y + 3)}" font-size="9" ${FONT} fill="#111827">${escapeHtml(s.name)}</text>`);
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${spec.widthPx} ${spec.heightPx}" width="100%" role="img" aria-label="${escapeHtml(spec.description)}"><title>${escapeHtml(spec.description)}</title>${parts.join('')}</svg>`;
}
