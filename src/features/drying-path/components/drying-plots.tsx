import { useState } from 'react';
import type { DryingPathAnswer } from '../../../../shared/schemas/drying-paths';
import { Plot, plotPalette } from '../../../components/plot/plot';

type Axis = 'time' | 'position';

/** Alternating light bands behind the traces, one per oven zone, labelled with the zone name. */
function zoneShapes(answer: DryingPathAnswer, axis: Axis) {
  const shapes = answer.zones.map((zone, i) => ({
    type: 'rect' as const,
    xref: 'x' as const,
    yref: 'paper' as const,
    x0: axis === 'time' ? zone.startTime : (zone.startPosition ?? 0),
    x1: axis === 'time' ? zone.endTime : (zone.endPosition ?? 0),
    y0: 0,
    y1: 1,
    fillcolor: i % 2 === 0 ? '#dbe6ef' : '#eceeea',
    opacity: 0.55,
    line: { width: 0 },
    layer: 'below' as const,
  }));
  const annotations = answer.zones.map((zone) => ({
    xref: 'x' as const,
    yref: 'paper' as const,
    x: axis === 'time' ? (zone.startTime + zone.endTime) / 2 : ((zone.startPosition ?? 0) + (zone.endPosition ?? 0)) / 2,
    y: 1.02,
    yanchor: 'bottom' as const,
    text: zone.name,
    showarrow: false,
    font: { size: 11, color: plotPalette.inkSoft },
  }));
  return { shapes, annotations };
}

const baseLayout = (xTitle: string, yTitle: string, answer: DryingPathAnswer, axis: Axis) => ({
  ...zoneShapes(answer, axis),
  margin: { l: 64, r: 16, t: 28, b: 48 },
  paper_bgcolor: plotPalette.paper,
  plot_bgcolor: plotPalette.paper,
  font: { family: plotPalette.font, color: plotPalette.ink, size: 12 },
  xaxis: { title: { text: xTitle }, gridcolor: plotPalette.grid, zeroline: false },
  yaxis: { title: { text: yTitle }, gridcolor: plotPalette.grid, zeroline: false },
  legend: { orientation: 'h' as const, y: -0.25 },
  showlegend: true,
});

/** Thickness, film temperature and the two Onset margins along the Drying path, against time or oven position. */
export function DryingPlots({ answer }: { answer: DryingPathAnswer }) {
  const hasPosition = answer.series.position !== null;
  const [axis, setAxis] = useState<Axis>(hasPosition ? 'position' : 'time');
  const x = axis === 'position' && answer.series.position ? answer.series.position : answer.series.time;
  const xTitle = axis === 'position' ? 'Oven position [m]' : 'Time [s]';
  // Margins of null (infinite: no onset possible) are left out of the line.
  const margin = (values: (number | null)[]) => values.map((m) => (m === null || !Number.isFinite(m) ? null : m));
  const height = 260;
  const smallest = Math.min(answer.onset.minSolutalMargin ?? Infinity, answer.onset.minThermalMargin ?? Infinity, 1);
  const marginFloor = Math.floor(Math.log10(smallest / 2));

  return (
    <div className="flex flex-col gap-3">
      {hasPosition && (
        <div role="radiogroup" aria-label="Plot against" className="no-print flex gap-4 text-sm">
          {(['position', 'time'] as const).map((value) => (
            <label key={value} className="flex items-center gap-2">
              <input type="radio" name="drying-axis" value={value} checked={axis === value} onChange={() => setAxis(value)} />
              {value === 'position' ? 'Against oven position' : 'Against time'}
            </label>
          ))}
        </div>
      )}
      <Plot
        label="Wet film thickness along the drying path"
        height={height}
        data={[{ x, y: answer.series.thickness.map((h) => h * 1e6), type: 'scatter', mode: 'lines', name: 'Wet thickness', line: { color: plotPalette.brand, width: 2 } }]}
        layout={baseLayout(xTitle, 'Thickness [µm]', answer, axis)}
      />
      <Plot
        label="Film temperature along the drying path"
        height={height}
        data={[{ x, y: answer.series.filmTemperature.map((t) => t - 273.15), type: 'scatter', mode: 'lines', name: 'Film temperature', line: { color: plotPalette.close, width: 2 } }]}
        layout={baseLayout(xTitle, 'Film temperature [°C]', answer, axis)}
      />
      <Plot
        label="Thermal and solutal onset margins along the drying path"
        height={height + 40}
        data={[
          { x, y: margin(answer.series.solutalMargin as (number | null)[]), type: 'scatter', mode: 'lines', name: 'Solutal margin', line: { color: plotPalette.over, width: 2 } },
          { x, y: margin(answer.series.thermalMargin as (number | null)[]), type: 'scatter', mode: 'lines', name: 'Thermal margin', line: { color: plotPalette.quiet, width: 2, dash: 'dash' } },
          { x: [x[0], x[x.length - 1]], y: [1, 1], type: 'scatter', mode: 'lines', name: 'Onset (margin 1)', line: { color: plotPalette.ink, width: 1, dash: 'dot' } },
        ]}
        layout={{
          ...baseLayout(xTitle, 'Onset margin [×] (log)', answer, axis),
          // Near 1 is what matters: show from below the smallest margin up to 10⁴ (larger margins run off the top).
          yaxis: { title: { text: 'Onset margin [×] (log)' }, type: 'log', range: [marginFloor, 4], exponentformat: 'power', gridcolor: plotPalette.grid },
        }}
      />
    </div>
  );
}
