import type * as PlotlyNamespace from 'plotly.js-dist-min';
import type { Config, Data, Layout, PlotMouseEvent } from 'plotly.js-dist-min';
import { useEffect, useRef, useState } from 'react';
import { Alert } from '../alert';
import { Spinner } from '../spinner';

export type { Data as PlotData, Layout as PlotLayout, PlotMouseEvent };

/** A point the person clicked, in data coordinates of the trace under the pointer. */
export type PlotClick = { x: number; y: number; traceName: string | undefined };

type PlotlyChartProps = {
  data: Data[];
  layout: Partial<Layout>;
  /** Read by screen readers in place of the drawing; say what the plot shows. */
  label: string;
  onPointClick?: (point: PlotClick) => void;
  heightPx?: number;
};

type PlotlyModule = typeof PlotlyNamespace;

const CONFIG: Partial<Config> = { displaylogo: false, responsive: true, modeBarButtonsToRemove: ['select2d', 'lasso2d'] };

/**
 * A plotly chart whose library (1.4 MB gzipped) is fetched only when the first chart mounts, so
 * pages without plots never download it. Re-renders with Plotly.react, which diffs in place.
 */
export function PlotlyChart({ data, layout, label, onPointClick, heightPx = 380 }: PlotlyChartProps) {
  const container = useRef<HTMLDivElement>(null);
  const [plotly, setPlotly] = useState<PlotlyModule | null>(null);
  const [loadFailed, setLoadFailed] = useState(false);
  const clickRef = useRef(onPointClick);
  clickRef.current = onPointClick;

  useEffect(() => {
    let cancelled = false;
    import('plotly.js-dist-min').then(
      (module) => {
        if (!cancelled) setPlotly(('default' in module ? module.default : module) as PlotlyModule);
      },
      () => {
        if (!cancelled) setLoadFailed(true);
      },
    );
    return () => {
      cancelled = true;
    };
  }, []);

  useEffect(() => {
    const element = container.current;
    if (!plotly || !element) return;
    const fullLayout: Partial<Layout> = {
      margin: { l: 64, r: 16, t: 24, b: 52 },
      font: { family: 'IBM Plex Sans, sans-serif', size: 12, color: '#334155' },
      legend: { orientation: 'h', y: -0.22 },
      height: heightPx,
      ...layout,
    };
    void plotly.react(element, data, fullLayout, CONFIG).then((plot) => {
      const emitter = plot as unknown as { removeAllListeners?: (event: string) => void; on: (event: string, handler: (e: PlotMouseEvent) => void) => void };
      emitter.removeAllListeners?.('plotly_click');
      emitter.on('plotly_click', (event) => {
        const point = event.points[0];
        if (!point || typeof point.x !== 'number' || typeof point.y !== 'number') return;
        clickRef.current?.({ x: point.x, y: point.y, traceName: point.data.name });
      });
    });
  }, [plotly, data, layout, heightPx]);

  useEffect(() => {
    const element = container.current;
    return () => {
      if (plotly && element) plotly.purge(element);
    };
  }, [plotly]);

  if (loadFailed) {
    return <Alert tone="error">The plotting library could not be loaded. Check your connection, then reload the page.</Alert>;
  }
  return (
    <figure className="relative" aria-label={label} style={{ minHeight: heightPx }}>
      {plotly ? null : (
        <div className="absolute inset-0 flex items-center justify-center text-accent-600">
          <Spinner label="Loading the plot…" />
        </div>
      )}
      <div ref={container} role="img" aria-label={label} data-testid="plotly-chart" />
    </figure>
  );
}
