import type { FootingPairResult } from '@porestack/types';
import { useEffect, useMemo, useRef, useState } from 'react';
import { formatMm, formatRatio } from './design-format';

/** What the plan draws of each footing: its plan rectangle (or circle) and its total settlement. */
export interface PlanFooting {
  id: string;
  xM: number;
  yM: number;
  alongXM: number;
  alongYM: number;
  circle: boolean;
  totalM: number;
}

type PlanViewProps = {
  footings: readonly PlanFooting[];
  pairs: readonly FootingPairResult[];
  limitLabel: string;
  selectedId: string | null;
  onSelect: (id: string) => void;
};

/** Light to dark: a sequential scale a person reads as "more settlement", also in greyscale. */
const STOPS: Array<[number, [number, number, number]]> = [
  [0, [255, 247, 214]],
  [0.35, [251, 191, 36]],
  [0.7, [217, 94, 27]],
  [1, [127, 29, 29]],
];

function colourAt(fraction: number): string {
  const f = Math.min(1, Math.max(0, fraction));
  for (let i = 1; i < STOPS.length; i += 1) {
    const [b, cb] = STOPS[i]!;
    const [a, ca] = STOPS[i - 1]!;
    if (f <= b) {
      const t = (f - a) / (b - a);
      return `rgb(${ca.map((c, k) => Math.round(c + (cb[k]! - c) * t)).join(',')})`;
    }
  }
  return 'rgb(127,29,29)';
}

const MARGIN_PX = 16;

/**
 * The footings on plan, to scale, coloured by total settlement, with every neighbouring pair
 * over the angular-distortion limit drawn as a red line. Drawn on a canvas (1,000 footings stay
 * quick); the pointer finds footings through a grid index, and a click selects one.
 */
export function PlanView({ footings, pairs, limitLabel, selectedId, onSelect }: PlanViewProps) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const [widthPx, setWidthPx] = useState(640);
  const [hover, setHover] = useState<{ footing: PlanFooting; x: number; y: number } | null>(null);
  const wrapper = useRef<HTMLDivElement>(null);

  useEffect(() => {
    const element = wrapper.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => setWidthPx(Math.max(240, Math.floor(entry?.contentRect.width ?? 640))));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  const geometry = useMemo(() => {
    const minX = Math.min(...footings.map((f) => f.xM - f.alongXM / 2));
    const maxX = Math.max(...footings.map((f) => f.xM + f.alongXM / 2));
    const minY = Math.min(...footings.map((f) => f.yM - f.alongYM / 2));
    const maxY = Math.max(...footings.map((f) => f.yM + f.alongYM / 2));
    const spanX = Math.max(maxX - minX, 1);
    const spanY = Math.max(maxY - minY, 1);
    const heightPx = Math.round(Math.min(640, Math.max(220, ((widthPx - 2 * MARGIN_PX) * spanY) / spanX + 2 * MARGIN_PX)));
    const scale = Math.min((widthPx - 2 * MARGIN_PX) / spanX, (heightPx - 2 * MARGIN_PX) / spanY);
    const offsetX = (widthPx - spanX * scale) / 2;
    const offsetY = (heightPx - spanY * scale) / 2;
    // y runs up on plan, down on screen.
    const toPx = (xM: number, yM: number) => ({ x: offsetX + (xM - minX) * scale, y: heightPx - offsetY - (yM - minY) * scale });
    const totals = footings.map((f) => f.totalM);
    const low = Math.min(...totals);
    const high = Math.max(...totals);
    // A coarse grid of footing indices for the pointer: each cell lists the footings it touches.
    const cell = 24;
    const grid = new Map<string, number[]>();
    footings.forEach((f, index) => {
      const a = toPx(f.xM - f.alongXM / 2, f.yM + f.alongYM / 2);
      const b = toPx(f.xM + f.alongXM / 2, f.yM - f.alongYM / 2);
      for (let gx = Math.floor(a.x / cell); gx <= Math.floor(b.x / cell); gx += 1) {
        for (let gy = Math.floor(a.y / cell); gy <= Math.floor(b.y / cell); gy += 1) {
          const key = `${gx}:${gy}`;
          grid.set(key, [...(grid.get(key) ?? []), index]);
        }
      }
    });
    return { heightPx, scale, toPx, low, high, grid, cell };
  }, [footings, widthPx]);

  useEffect(() => {
    const element = canvas.current;
    const context = element?.getContext('2d');
    if (!element || !context) return;
    const ratio = window.devicePixelRatio || 1;
    element.width = widthPx * ratio;
    element.height = geometry.heightPx * ratio;
    context.setTransform(ratio, 0, 0, ratio, 0, 0);
    context.clearRect(0, 0, widthPx, geometry.heightPx);
    const { toPx, scale, low, high } = geometry;
    const byId = new Map(footings.map((f) => [f.id, f]));
    for (const f of footings) {
      const centre = toPx(f.xM, f.yM);
      context.fillStyle = colourAt(high > low ? (f.totalM - low) / (high - low) : 0.5);
      context.strokeStyle = f.id === selectedId ? '#0f172a' : '#475569';
      context.lineWidth = f.id === selectedId ? 3 : 1;
      context.beginPath();
      if (f.circle) context.arc(centre.x, centre.y, Math.max(2, (f.alongXM * scale) / 2), 0, 2 * Math.PI);
      else context.rect(centre.x - (f.alongXM * scale) / 2, centre.y - (f.alongYM * scale) / 2, Math.max(2, f.alongXM * scale), Math.max(2, f.alongYM * scale));
      context.fill();
      context.stroke();
    }
    context.strokeStyle = '#dc2626';
    context.lineWidth = 2.5;
    for (const pair of pairs) {
      if (pair.withinDesignLimit) continue;
      const a = byId.get(pair.footingIds[0]);
      const b = byId.get(pair.footingIds[1]);
      if (!a || !b) continue;
      const pa = toPx(a.xM, a.yM);
      const pb = toPx(b.xM, b.yM);
      context.beginPath();
      context.moveTo(pa.x, pa.y);
      context.lineTo(pb.x, pb.y);
      context.stroke();
    }
    if (footings.length <= 60) {
      context.font = '11px "IBM Plex Sans", sans-serif';
      context.textAlign = 'center';
      for (const f of footings) {
        const centre = toPx(f.xM, f.yM);
        // Light text on the dark end of the scale, dark text on the light end.
        context.fillStyle = high > low && (f.totalM - low) / (high - low) > 0.55 ? '#ffffff' : '#0f172a';
        context.fillText(f.id, centre.x, centre.y + 4);
      }
    }
  }, [footings, pairs, geometry, selectedId, widthPx]);

  const footingAt = (x: number, y: number): PlanFooting | null => {
    const candidates = geometry.grid.get(`${Math.floor(x / geometry.cell)}:${Math.floor(y / geometry.cell)}`) ?? [];
    for (const index of candidates) {
      const f = footings[index]!;
      const a = geometry.toPx(f.xM - f.alongXM / 2, f.yM + f.alongYM / 2);
      const b = geometry.toPx(f.xM + f.alongXM / 2, f.yM - f.alongYM / 2);
      if (x >= a.x - 2 && x <= b.x + 2 && y >= a.y - 2 && y <= b.y + 2) return f;
    }
    return null;
  };
  const over = pairs.filter((p) => !p.withinDesignLimit).length;

  return (
    <div ref={wrapper} className="relative">
      <canvas
        ref={canvas}
        role="img"
        aria-label={`Plan of ${footings.length} footings coloured by total settlement, ${formatMm(geometry.low)} to ${formatMm(geometry.high)} mm; ${over} neighbouring pair${over === 1 ? '' : 's'} over ${limitLabel} drawn in red`}
        style={{ width: widthPx, height: geometry.heightPx }}
        className="cursor-crosshair rounded-md border border-slate-200 bg-white"
        onMouseMove={(e) => {
          const rect = e.currentTarget.getBoundingClientRect();
          const x = e.clientX - rect.left;
          const y = e.clientY - rect.top;
          const found = footingAt(x, y);
          setHover(found ? { footing: found, x, y } : null);
        }}
        onMouseLeave={() => setHover(null)}
        onClick={(e) => {
          const rect = e.currentTarget.getBoundingClientRect();
          const found = footingAt(e.clientX - rect.left, e.clientY - rect.top);
          if (found) onSelect(found.id);
        }}
      />
      {hover ? (
        <div className="pointer-events-none absolute rounded bg-slate-900 px-2 py-1 text-xs text-white" style={{ left: Math.min(hover.x + 12, widthPx - 120), top: hover.y + 12 }}>
          {hover.footing.id}: {formatMm(hover.footing.totalM)} mm
        </div>
      ) : null}
      <div className="mt-2 flex flex-wrap items-center gap-3 text-xs text-slate-600">
        <span>Total settlement</span>
        <span className="inline-block h-3 w-40 rounded" style={{ background: `linear-gradient(to right, ${[0, 0.35, 0.7, 1].map(colourAt).join(', ')})` }} aria-hidden="true" />
        <span>
          {formatMm(geometry.low)}–{formatMm(geometry.high)} mm
        </span>
        <span className="inline-block h-0.5 w-6 bg-red-600" aria-hidden="true" />
        <span>
          pair over {limitLabel} ({over})
        </span>
        <span>· x to the right, y up; hover for values, click to open a footing</span>
      </div>
      <div className="sr-only">
        {/* The keyboard and screen-reader way to pick a footing. */}
        <label>
          Open a footing
          <select value={selectedId ?? ''} onChange={(e) => onSelect(e.target.value)}>
            {footings.map((f) => (
              <option key={f.id} value={f.id}>
                {f.id}
              </option>
            ))}
          </select>
        </label>
      </div>
      {over > 0 ? <p className="sr-only">Pairs over the limit: {pairs.filter((p) => !p.withinDesignLimit).map((p) => `${p.footingIds[0]}–${p.footingIds[1]} ${formatRatio(p.angularDistortion)}`).join(', ')}</p> : null}
    </div>
  );
}
