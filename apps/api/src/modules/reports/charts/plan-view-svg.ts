import { escapeHtml } from '../pdf/html.js';

/**
 * A settlement check's footings in plan, drawn to scale as SVG for the printed summary. It
 * must read in black and white: each footing carries its mark and total settlement in words,
 * footings over the total limit are hatched, and pairs over the angular-distortion limit are
 * joined by a dashed line labelled with their distortion — never told apart by colour alone.
 */
export interface PlanFootingShape {
  id: string;
  shape: 'rectangle' | 'square' | 'circle' | 'strip';
  xM: number;
  yM: number;
  widthM: number;
  lengthM: number | null;
  totalMm: number;
  overTotalLimit: boolean;
}

export interface PlanPairOverLimit {
  from: string;
  to: string;
  /** What is written on the dashed line, e.g. "1/312". */
  label: string;
}

export interface PlanViewSpec {
  description: string;
  footings: readonly PlanFootingShape[];
  pairsOverLimit: readonly PlanPairOverLimit[];
  /** Words for the legend's dashed line, e.g. "pair over the angular-distortion limit 1/500 (Bjerrum (1963))". */
  pairLegend: string;
  totalLegend: string;
}

/** Above this many footings the marks and settlements are left off the drawing (the table lists them). */
export const PLAN_LABEL_LIMIT = 60;
/** A strip has no length; it is drawn this many widths long, and the caption says so. */
export const STRIP_DRAWN_WIDTHS = 6;

const WIDTH = 680;
const PLOT_HEIGHT_MAX = 520;
const MARGIN = 34;
const LEGEND_HEIGHT = 62;
/** Room under the footings for the scale bar and the plan axes, so they never sit on a footing. */
const SCALE_STRIP = 30;
const FONT = 'font-family="IBM Plex Sans, DejaVu Sans, sans-serif"';
const fmt = (n: number) => (Math.round(n * 100) / 100).toString();

function halfSizes(f: PlanFootingShape): { hx: number; hy: number } {
  if (f.shape === 'strip') return { hx: f.widthM / 2, hy: (f.widthM * STRIP_DRAWN_WIDTHS) / 2 };
  if (f.shape === 'rectangle') return { hx: f.widthM / 2, hy: (f.lengthM ?? f.widthM) / 2 };
  return { hx: f.widthM / 2, hy: f.widthM / 2 };
}

/** A round scale-bar length (1, 2 or 5 × 10ⁿ m) near a fifth of the drawing's width. */
function scaleBarMetres(spanM: number): number {
  const target = spanM / 5;
  const power = 10 ** Math.floor(Math.log10(target));
  return [5, 2, 1].map((m) => m * power).find((m) => m <= target) ?? power;
}

interface Point {
  x: number;
  y: number;
}

/** Distance from p to the segment ab, px. */
function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/**
 * The dashed line of a pair: straight, unless it would run through a third footing's centre
 * (a pair along a row that skips a footing), when it bows out so the two lines and their
 * labels stay apart.
 */
function pairPath(a: Point, b: Point, centres: readonly Point[]): { path: string; labelAt: Point } {
  const middle = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  const passesOver = centres.some((c) => c !== a && c !== b && distanceToSegment(c, a, b) < 6);
  if (!passesOver) return { path: `M${fmt(a.x)} ${fmt(a.y)}L${fmt(b.x)} ${fmt(b.y)}`, labelAt: middle };
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  // Bow towards the top of the drawing (or to the left for a vertical pair).
  let nx = (a.y - b.y) / length;
  let ny = (b.x - a.x) / length;
  if (ny > 0 || (ny === 0 && nx > 0)) [nx, ny] = [-nx, -ny];
  const bow = Math.max(18, length * 0.22);
  const control = { x: middle.x + nx * bow * 2, y: middle.y + ny * bow * 2 };
  // A quadratic curve reaches half its control point's offset at its middle.
  return { path: `M${fmt(a.x)} ${fmt(a.y)}Q${fmt(control.x)} ${fmt(control.y)} ${fmt(b.x)} ${fmt(b.y)}`, labelAt: { x: middle.x + nx * bow, y: middle.y + ny * bow } };
}

export function renderPlanView(spec: PlanViewSpec): string {
  const boxes = spec.footings.map((f) => ({ f, ...halfSizes(f) }));
  const minX = Math.min(...boxes.map((b) => b.f.xM - b.hx));
  const maxX = Math.max(...boxes.map((b) => b.f.xM + b.hx));
  const minY = Math.min(...boxes.map((b) => b.f.yM - b.hy));
  const maxY = Math.max(...boxes.map((b) => b.f.yM + b.hy));
  const spanX = Math.max(maxX - minX, 1);
  const spanY = Math.max(maxY - minY, 1);
  // One scale for both directions: the plan is to scale, not stretched to fill the box.
  const scale = Math.min((WIDTH - 2 * MARGIN) / spanX, (PLOT_HEIGHT_MAX - 2 * MARGIN) / spanY);
  const plotHeight = spanY * scale + 2 * MARGIN + SCALE_STRIP;
  const height = plotHeight + LEGEND_HEIGHT;
  const offsetX = (WIDTH - spanX * scale) / 2;
  const px = (x: number) => offsetX + (x - minX) * scale;
  // Plan y grows upwards, as on a drawing.
  const py = (y: number) => MARGIN + (maxY - y) * scale;
  const centres = new Map(spec.footings.map((f) => [f.id, { x: px(f.xM), y: py(f.yM) }]));
  const labelled = spec.footings.length <= PLAN_LABEL_LIMIT;
  const parts: string[] = [];
  parts.push(
    '<defs><pattern id="plan-over-limit" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="5" stroke="#111827" stroke-width="1.2"/></pattern></defs>',
  );
  parts.push(`<rect x="0.5" y="0.5" width="${WIDTH - 1}" height="${fmt(plotHeight - 1)}" fill="none" stroke="#9ca3af" stroke-width="0.6"/>`);
  for (const { f, hx, hy } of boxes) {
    const fill = f.overTotalLimit ? 'url(#plan-over-limit)' : '#ffffff';
    const stroke = `stroke="#111827" stroke-width="${f.overTotalLimit ? 1.6 : 0.9}"`;
    if (f.shape === 'circle') parts.push(`<circle cx="${fmt(px(f.xM))}" cy="${fmt(py(f.yM))}" r="${fmt(hx * scale)}" fill="${fill}" ${stroke}/>`);
    else parts.push(`<rect x="${fmt(px(f.xM - hx))}" y="${fmt(py(f.yM + hy))}" width="${fmt(2 * hx * scale)}" height="${fmt(2 * hy * scale)}" fill="${fill}" ${stroke}/>`);
    parts.push(`<circle cx="${fmt(px(f.xM))}" cy="${fmt(py(f.yM))}" r="1.4" fill="#111827"/>`);
  }
  const points = [...centres.values()];
  for (const pair of spec.pairsOverLimit) {
    const a = centres.get(pair.from);
    const b = centres.get(pair.to);
    if (!a || !b) continue;
    const { path, labelAt } = pairPath(a, b, points);
    parts.push(`<path d="${path}" fill="none" stroke="#111827" stroke-width="1.4" stroke-dasharray="6 3"/>`);
    parts.push(
      `<text x="${fmt(labelAt.x)}" y="${fmt(labelAt.y - 3)}" text-anchor="middle" font-size="8.5" font-style="italic" ${FONT} fill="#111827" stroke="#ffffff" stroke-width="2.6" paint-order="stroke">${escapeHtml(pair.label)}</text>`,
    );
  }
  if (labelled) {
    for (const { f, hy } of boxes) {
      const x = fmt(px(f.xM));
      const top = py(f.yM + hy);
      parts.push(
        `<text x="${x}" y="${fmt(top - 12)}" text-anchor="middle" font-size="8.5" font-weight="600" ${FONT} fill="#111827" stroke="#ffffff" stroke-width="2.6" paint-order="stroke">${escapeHtml(f.id)}</text>`,
        `<text x="${x}" y="${fmt(top - 3)}" text-anchor="middle" font-size="8" ${FONT} fill="#111827" stroke="#ffffff" stroke-width="2.6" paint-order="stroke">${f.totalMm.toFixed(1)} mm</text>`,
      );
    }
  }
  // Scale bar and plan axes, bottom left of the drawing.
  const barM = scaleBarMetres(spanX);
  const barY = plotHeight - 12;
  parts.push(
    `<path d="M${MARGIN} ${fmt(barY - 4)}V${fmt(barY)}H${fmt(MARGIN + barM * scale)}V${fmt(barY - 4)}" fill="none" stroke="#111827" stroke-width="1"/>`,
    `<text x="${fmt(MARGIN + barM * scale + 5)}" y="${fmt(barY)}" font-size="8.5" ${FONT} fill="#111827">${barM} m</text>`,
    `<path d="M${WIDTH - 60} ${fmt(barY)}h26m-4 -3l4 3l-4 3M${WIDTH - 60} ${fmt(barY)}v-26m-3 4l3 -4l3 4" fill="none" stroke="#111827" stroke-width="1"/>`,
    `<text x="${WIDTH - 30} " y="${fmt(barY + 3)}" font-size="8.5" ${FONT} fill="#111827">x</text><text x="${WIDTH - 63}" y="${fmt(barY - 30)}" font-size="8.5" ${FONT} fill="#111827">y</text>`,
  );
  const legendTop = plotHeight + 14;
  parts.push(
    `<rect x="4" y="${fmt(legendTop - 7)}" width="18" height="10" fill="#ffffff" stroke="#111827" stroke-width="0.9"/><text x="28" y="${fmt(legendTop + 2)}" font-size="8.5" ${FONT} fill="#111827">footing, drawn to scale; mark and total settlement written above it</text>`,
    `<rect x="4" y="${fmt(legendTop + 9)}" width="18" height="10" fill="url(#plan-over-limit)" stroke="#111827" stroke-width="1.6"/><text x="28" y="${fmt(legendTop + 18)}" font-size="8.5" ${FONT} fill="#111827">${escapeHtml(spec.totalLegend)}</text>`,
    `<line x1="4" y1="${fmt(legendTop + 30)}" x2="22" y2="${fmt(legendTop + 30)}" stroke="#111827" stroke-width="1.4" stroke-dasharray="6 3"/><text x="28" y="${fmt(legendTop + 33)}" font-size="8.5" ${FONT} fill="#111827">${escapeHtml(spec.pairLegend)}</text>`,
  );
  if (!labelled) {
    parts.push(`<text x="28" y="${fmt(legendTop + 47)}" font-size="8.5" ${FONT} fill="#111827">Marks and settlements are left off above ${PLAN_LABEL_LIMIT} footings; the results table lists every one.</text>`);
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${WIDTH} ${fmt(height)}" width="100%" role="img" aria-label="${escapeHtml(spec.description)}"><title>${escapeHtml(spec.description)}</title>${parts.join('')}</svg>`;
}
