import type { Data, Layout, Shape } from 'plotly.js';
import { gaugeFlagLabels, type GaugeFlag, type GaugeWindow, type ReadingSeries } from '../../../../shared/schemas/gauge-log';
import { Plot, plotPalette } from '../../../components/plot/plot';
import type { UnitSystem } from '../../../lib/unit-system';
import { thicknessAxis } from './format-gauge';

const markerSymbol: Record<GaugeFlag, string> = { quiet: 'circle', close: 'diamond', over: 'square' };
const markerColour: Record<GaugeFlag, string> = { quiet: plotPalette.quiet, close: plotPalette.close, over: plotPalette.over };

/**
 * Wet thickness against position along the web (or time), with the largest quiet thickness
 * (margin 1) and the close limit (alert threshold) drawn as lines; Close and Over readings are
 * marked by shape, colour and their word in the legend.
 */
export function ThicknessChart({ series, window, system }: { series: ReadingSeries; window: GaugeWindow; system: UnitSystem }) {
  const { unit, factor } = thicknessAxis(system);
  const isTime = series.axis === 'time';
  const xs = isTime ? series.x.map((ms) => new Date(ms).toISOString()) : series.x;
  const traces: Data[] = (['quiet', 'close', 'over'] as const).map((flag) => {
    const index = series.flag.flatMap((f, i) => (f === flag ? [i] : []));
    return {
      type: 'scatter',
      mode: 'markers',
      name: `${gaugeFlagLabels[flag]} (${index.length})`,
      x: index.map((i) => xs[i]),
      y: index.map((i) => series.thickness[i] * factor),
      text: index.map((i) => `run ${series.run[i]} · ${gaugeFlagLabels[flag]}`),
      hovertemplate: `%{text}<br>%{y:.4g} ${unit}<extra></extra>`,
      marker: { symbol: markerSymbol[flag], color: markerColour[flag], size: flag === 'quiet' ? 6 : 9, line: { width: flag === 'quiet' ? 0 : 1, color: plotPalette.ink } },
    } as Data;
  });
  const shapes: Partial<Shape>[] = [];
  const annotations: Layout['annotations'] = [];
  const line = (y: number | null, colour: string, dash: 'solid' | 'dash', label: string) => {
    if (y === null) return;
    shapes.push({ type: 'line', xref: 'paper', x0: 0, x1: 1, y0: y * factor, y1: y * factor, line: { color: colour, width: 2, dash } });
    annotations.push({ xref: 'paper', x: 0.01, xanchor: 'left', y: y * factor, yanchor: 'bottom', text: label, showarrow: false, font: { color: colour, size: 12 }, bgcolor: 'rgba(255,255,255,0.85)' });
  };
  line(window.quietLimits.upper, plotPalette.over, 'solid', `Largest quiet thickness ${((window.quietLimits.upper ?? 0) * factor).toPrecision(4)} ${unit} (margin 1)`);
  line(window.closeLimits.upper, plotPalette.close, 'dash', `Close above ${((window.closeLimits.upper ?? 0) * factor).toPrecision(4)} ${unit} (margin ${window.alertThreshold})`);
  line(window.quietLimits.lower, plotPalette.over, 'solid', `Smallest quiet thickness ${((window.quietLimits.lower ?? 0) * factor).toPrecision(4)} ${unit} (margin 1)`);
  line(window.closeLimits.lower, plotPalette.close, 'dash', `Close below ${((window.closeLimits.lower ?? 0) * factor).toPrecision(4)} ${unit} (margin ${window.alertThreshold})`);
  const yValues = [...series.thickness.map((t) => t * factor), ...[window.quietLimits.upper, window.closeLimits.upper, window.closeLimits.lower].filter((v): v is number => v !== null).map((v) => v * factor)];
  const yMax = yValues.length > 0 ? Math.max(...yValues) * 1.08 : undefined;
  const layout: Partial<Layout> = {
    margin: { l: 70, r: 20, t: 20, b: 60 },
    paper_bgcolor: plotPalette.paper,
    plot_bgcolor: plotPalette.paper,
    font: { family: plotPalette.font, color: plotPalette.ink, size: 13 },
    xaxis: { title: { text: isTime ? 'Time of reading' : 'Position along the web [m]' }, gridcolor: plotPalette.grid, type: isTime ? 'date' : 'linear', zeroline: false },
    yaxis: { title: { text: `Wet thickness [${unit}]` }, gridcolor: plotPalette.grid, rangemode: 'tozero', range: yMax ? [0, yMax] : undefined },
    legend: { orientation: 'h', y: -0.22 },
    shapes,
    annotations,
  };
  return <Plot label="Wet thickness of each reading against the quiet window" height={420} data={traces} layout={layout} />;
}
