import type { MeltPoolAnswer } from '../../../../shared/schemas/melt-pool';
import { Plot, plotPalette } from '../../../components/plot/plot';

/** σ(T) across (and a little beyond) the pool, with dσ/dT on a second axis and the sign change marked. */
export function SurfaceTensionCurve({ answer }: { answer: MeltPoolAnswer }) {
  const t = answer.curve.map((p) => p.temperature);
  const change = answer.signChangeTemperature ?? answer.signChangeTemperatureWide;
  const inView = change !== null && change >= t[0] && change <= t[t.length - 1];
  const edge = t[0] + (t[t.length - 1] - t[0]) / 12;
  const peak = t[t.length - 1] - (t[t.length - 1] - t[0]) / 12;
  return (
    <Plot
      label="Surface tension against temperature across the melt pool, with its slope"
      height={340}
      data={[
        { x: t, y: answer.curve.map((p) => p.surfaceTension * 1e3), type: 'scatter', mode: 'lines', name: 'σ [mN/m]', line: { color: plotPalette.brand, width: 2.5 } },
        { x: t, y: answer.curve.map((p) => p.slope * 1e3), type: 'scatter', mode: 'lines', name: 'dσ/dT [mN/(m·K)]', yaxis: 'y2', line: { color: plotPalette.close, width: 1.5, dash: 'dash' } },
      ]}
      layout={{
        margin: { l: 64, r: 70, t: 16, b: 48 },
        paper_bgcolor: plotPalette.paper,
        plot_bgcolor: plotPalette.paper,
        font: { family: plotPalette.font, color: plotPalette.ink, size: 12 },
        xaxis: { title: { text: 'Surface temperature [K]' }, gridcolor: plotPalette.grid },
        yaxis: { title: { text: 'Surface tension σ [mN/m]' }, gridcolor: plotPalette.grid },
        yaxis2: { title: { text: 'dσ/dT [mN/(m·K)]' }, overlaying: 'y', side: 'right', zeroline: true, zerolinecolor: plotPalette.close, showgrid: false },
        legend: { orientation: 'h', y: -0.2 },
        shapes: [
          { type: 'rect', xref: 'x', yref: 'paper', x0: edge, x1: peak, y0: 0, y1: 1, fillcolor: '#dbe6ef', opacity: 0.45, line: { width: 0 }, layer: 'below' },
          ...(inView ? [{ type: 'line' as const, xref: 'x' as const, yref: 'paper' as const, x0: change, x1: change, y0: 0, y1: 1, line: { color: plotPalette.over, width: 1.5, dash: 'dot' as const } }] : []),
        ],
        annotations: [
          { xref: 'x', yref: 'paper', x: (edge + peak) / 2, y: 1, yanchor: 'top', text: 'pool surface', showarrow: false, font: { size: 11, color: plotPalette.inkSoft } },
          ...(inView ? [{ xref: 'x' as const, yref: 'paper' as const, x: change, y: 0.06, text: `dσ/dT = 0 at ${Math.round(change)} K`, showarrow: false, xanchor: 'left' as const, font: { size: 11, color: plotPalette.over } }] : []),
        ],
      }}
    />
  );
}
