import { lazy, Suspense } from 'react';
import type { PlotParams } from 'react-plotly.js';
import { Loading } from '../ui/loading';

const PlotlyFigure = lazy(() => import('./plotly-figure'));

/** QuietLayer's plot palette (tailwind.config.ts): ink for text, slate for grid lines, brand for marks. */
export const plotPalette = {
  ink: '#1d2733',
  inkSoft: '#4a5868',
  grid: '#d3d8dc',
  paper: '#ffffff',
  brand: '#2d4f6c',
  quiet: '#0f766e',
  close: '#b45309',
  over: '#b3123c',
  font: '"Noto Sans", system-ui, sans-serif',
} as const;

/**
 * An interactive figure. The plotting library (≈ 1.4 MB gzip) loads on first use, with a
 * visible progress note while it does, so pages without a plot stay small.
 */
export function Plot(props: PlotParams & { label: string; height: number }) {
  const { label, height, ...params } = props;
  return (
    <Suspense fallback={<div style={{ minHeight: height }}><Loading label={`Loading the plot: ${label}…`} /></div>}>
      <div role="figure" aria-label={label} data-testid="plot" style={{ width: '100%', height }}>
        <PlotlyFigure
          useResizeHandler
          style={{ width: '100%', height }}
          {...params}
          config={{ displaylogo: false, responsive: true, modeBarButtonsToRemove: ['select2d', 'lasso2d'], ...(params.config ?? {}) }}
        />
      </div>
    </Suspense>
  );
}
