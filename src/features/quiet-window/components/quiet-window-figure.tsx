import { useId, useState } from 'react';
import type { Data, Layout } from 'plotly.js';
import type { QuietWindow } from '../../../../shared/schemas/layer-checks';
import { fromSi } from '../../../../shared/units/from-si';
import { Plot, plotPalette } from '../../../components/plot/plot';
import { formatInSystem, type UnitSystem } from '../../../lib/unit-system';

const depthUnits = ['µm', 'mm', 'mil'] as const;
const deltaTUnits = ['K', '°F'] as const;
const fluxUnits = ['W/m²', 'kW/m²'] as const;
type DepthUnit = (typeof depthUnits)[number];
type DriveUnit = (typeof deltaTUnits)[number] | (typeof fluxUnits)[number];

/** Margins are coloured on a log scale from 0.1× to 10×: crimson → amber at 1 → teal from the threshold. */
function marginColourscale(alertThreshold: number): [number, string][] {
  const at = (margin: number) => (Math.log10(margin) + 1) / 2;
  const threshold = Math.min(9, Math.max(1.02, alertThreshold));
  return [
    [0, '#7a0c29'],
    [at(0.5), plotPalette.over],
    [at(0.999), '#f3b7c6'],
    [at(1), '#fbe6c8'],
    [at(threshold), plotPalette.close],
    [at(threshold) + 0.001, '#ccece8'],
    [Math.max(at(3), at(threshold) + 0.002), '#5fb3aa'],
    [1, plotPalette.quiet],
  ];
}

function defaultDepthUnit(system: UnitSystem): DepthUnit {
  return system === 'us' ? 'mil' : 'µm';
}

/**
 * The quiet window: the onset margin over depth × temperature difference (or × heat flux), the
 * cellular onset boundary and the long-wave boundary as lines, the operating point, and the two
 * sizing answers under it. Hover shows the margin at each grid point in the chosen units.
 */
export function QuietWindowFigure({ window: w, system, threshold }: { window: QuietWindow; system: UnitSystem; threshold: number }) {
  const selectId = useId();
  const [depthUnit, setDepthUnit] = useState<DepthUnit>(defaultDepthUnit(system));
  const flux = w.driveKind === 'heat-flux';
  const [driveUnitChoice, setDriveUnit] = useState<DriveUnit>(flux ? 'W/m²' : system === 'us' ? '°F' : 'K');
  const driveUnit: DriveUnit = flux ? ((fluxUnits as readonly string[]).includes(driveUnitChoice) ? driveUnitChoice : 'W/m²') : (deltaTUnits as readonly string[]).includes(driveUnitChoice) ? driveUnitChoice : 'K';
  const driveKind = flux ? 'heatFlux' : 'temperatureDifference';
  const toDepth = (si: number) => fromSi(si, depthUnit, 'length');
  const toDrive = (si: number) => fromSi(si, driveUnit, driveKind);
  const depths = w.depths.map(toDepth);
  const drives = w.drives.map(toDrive);
  // No onset possible counts as the quietest colour (top of the scale).
  const logMargin = w.margin.map((row) => row.map((m) => (m === null ? 1 : Math.log10(Math.max(1e-3, Math.min(1e3, m))))));
  const hoverMargin = w.margin.map((row) => row.map((m) => (m === null ? 'no onset' : `${m.toPrecision(3)}×`)));
  const driveTitle = flux ? `Heat flux q [${driveUnit}]` : `Temperature difference ΔT [${driveUnit}]`;

  const data: Data[] = [
    {
      type: 'heatmap',
      x: depths,
      y: drives,
      z: logMargin,
      zmin: -1,
      zmax: 1,
      zsmooth: 'best',
      colorscale: marginColourscale(threshold),
      customdata: hoverMargin as never,
      hovertemplate: `depth %{x:.4g} ${depthUnit}<br>${flux ? 'q' : 'ΔT'} %{y:.4g} ${driveUnit}<br>margin %{customdata}<extra></extra>`,
      colorbar: {
        title: { text: 'Onset margin ×', side: 'right' },
        tickvals: [-1, Math.log10(0.5), 0, Math.log10(threshold), Math.log10(3), 1],
        ticktext: ['≤ 0.1', '0.5', '1', threshold.toPrecision(3), '3', '≥ 10'],
        thickness: 14,
      },
      name: 'Onset margin',
    } as Data,
    {
      type: 'scatter',
      mode: 'lines',
      x: depths,
      y: w.cellBoundary.map((d) => (d === null ? null : toDrive(d))),
      line: { color: plotPalette.ink, width: 2.5 },
      name: 'Cell onset (margin 1)',
      hovertemplate: `cell onset: depth %{x:.4g} ${depthUnit}, ${flux ? 'q' : 'ΔT'} %{y:.4g} ${driveUnit}<extra></extra>`,
      connectgaps: false,
    },
    {
      type: 'scatter',
      mode: 'lines',
      x: depths,
      y: w.longWaveBoundary.map((d) => (d === null ? null : toDrive(d))),
      line: { color: plotPalette.brand, width: 2.5, dash: 'dash' },
      name: 'Long-wave thinning onset',
      hovertemplate: `long-wave onset: depth %{x:.4g} ${depthUnit}, ${flux ? 'q' : 'ΔT'} %{y:.4g} ${driveUnit}<extra></extra>`,
      connectgaps: false,
    },
    {
      type: 'scatter',
      mode: 'markers',
      x: [toDepth(w.operatingPoint.depth)],
      y: [toDrive(w.operatingPoint.drive)],
      marker: { size: 14, color: '#ffffff', line: { color: plotPalette.ink, width: 3 }, symbol: 'diamond' },
      name: 'This check',
      hovertemplate: `this check: depth %{x:.4g} ${depthUnit}, ${flux ? 'q' : 'ΔT'} %{y:.4g} ${driveUnit}<extra></extra>`,
    },
  ];

  // The map's own extent; boundary lines that leave it are clipped rather than stretching the axes.
  const halfStep = drives.length > 1 ? (drives[1]! - drives[0]!) / 2 : 0;
  const yRange: [number, number] = [drives[0]! - halfStep, drives[drives.length - 1]! + halfStep];
  const xRange: [number, number] = [Math.log10(depths[0]!), Math.log10(depths[depths.length - 1]!)];

  const layout: Partial<Layout> = {
    autosize: true,
    margin: { l: 72, r: 24, t: 16, b: 64 },
    paper_bgcolor: plotPalette.paper,
    plot_bgcolor: plotPalette.paper,
    font: { family: plotPalette.font, color: plotPalette.ink, size: 13 },
    xaxis: { title: { text: `Layer depth d [${depthUnit}]` }, type: 'log', range: xRange, gridcolor: plotPalette.grid, linecolor: plotPalette.inkSoft },
    yaxis: { title: { text: driveTitle }, range: yRange, gridcolor: plotPalette.grid, linecolor: plotPalette.inkSoft, zeroline: false },
    legend: { orientation: 'h', x: 0, y: -0.2, bgcolor: 'rgba(255,255,255,0.85)' },
    hoverlabel: { font: { family: plotPalette.font } },
  };

  return (
    <div className="flex flex-col gap-3" data-testid="quiet-window">
      <div className="no-print flex flex-wrap items-end gap-4">
        <label htmlFor={`${selectId}-depth`} className="flex flex-col gap-1 text-sm font-semibold">
          Depth axis
          <select
            id={`${selectId}-depth`}
            value={depthUnit}
            onChange={(event) => setDepthUnit(event.target.value as DepthUnit)}
            className="min-h-10 rounded-md border border-slate-line bg-paper-raised px-2 font-normal"
          >
            {depthUnits.map((unit) => (
              <option key={unit} value={unit}>
                {unit}
              </option>
            ))}
          </select>
        </label>
        <label htmlFor={`${selectId}-drive`} className="flex flex-col gap-1 text-sm font-semibold">
          {flux ? 'Heat-flux axis' : 'Temperature-difference axis'}
          <select
            id={`${selectId}-drive`}
            value={driveUnit}
            onChange={(event) => setDriveUnit(event.target.value as DriveUnit)}
            className="min-h-10 rounded-md border border-slate-line bg-paper-raised px-2 font-normal"
          >
            {(flux ? fluxUnits : deltaTUnits).map((unit) => (
              <option key={unit} value={unit}>
                {unit === '°F' ? '°F (difference)' : unit}
              </option>
            ))}
          </select>
        </label>
      </div>
      <div>
        <Plot height={460} label={`Quiet window: onset margin over layer depth and ${flux ? 'heat flux' : 'temperature difference'}`} data={data} layout={layout} />
      </div>
      <dl className="grid grid-cols-1 gap-2 text-[0.95rem] sm:grid-cols-3" data-testid="window-sizing">
        <div className="rounded-md bg-paper-sunk px-3 py-2">
          <dt className="text-sm text-ink-soft">Quiet depths at this heating</dt>
          <dd className="font-semibold tabular-nums">
            {w.sizing.minStableDepth !== null && w.sizing.maxStableDepth !== null && w.sizing.minStableDepth > w.sizing.maxStableDepth ? (
              <span className="text-over-dark">
                None: cells above {formatInSystem(w.sizing.maxStableDepth, 'length', system)}, long-wave thinning below {formatInSystem(w.sizing.minStableDepth, 'length', system)}.
              </span>
            ) : (
              <>
                {w.sizing.minStableDepth === null ? 'from 0' : `from ${formatInSystem(w.sizing.minStableDepth, 'length', system)}`}{' '}
                {w.sizing.maxStableDepth === null ? 'with no upper limit' : `to ${formatInSystem(w.sizing.maxStableDepth, 'length', system)}`}
              </>
            )}
          </dd>
        </div>
        <div className="rounded-md bg-paper-sunk px-3 py-2">
          <dt className="text-sm text-ink-soft">Largest quiet ΔT at this depth</dt>
          <dd className="font-semibold tabular-nums">{w.sizing.maxDeltaT === null ? 'no limit' : formatInSystem(w.sizing.maxDeltaT, 'temperatureDifference', system)}</dd>
        </div>
        <div className="rounded-md bg-paper-sunk px-3 py-2">
          <dt className="text-sm text-ink-soft">Reading the map</dt>
          <dd className="text-sm">
            Solid line: cells set in above it. Dashed: long-wave thinning where the surface can deform. ◇ marks this check.
          </dd>
        </div>
      </dl>
    </div>
  );
}
