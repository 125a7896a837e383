import type { PropertySpread } from '../../../../shared/schemas/property-spreads';
import { spreadFieldLabels, type SpreadField } from '../../../../shared/schemas/property-spreads';
import { Plot, plotPalette } from '../../../components/plot/plot';

/** Horizontal bars of the rank correlation between each property and the margin, largest effect on top. */
export function SpreadSensitivityChart({ result }: { result: NonNullable<PropertySpread['result']> }) {
  const rows = [...result.sensitivity].reverse();
  return (
    <Plot
      label="Which property moves the onset margin most (rank correlation with the margin)"
      height={Math.max(180, 60 + rows.length * 38)}
      data={[
        {
          type: 'bar',
          orientation: 'h',
          x: rows.map((s) => s.rankCorrelation),
          y: rows.map((s) => spreadFieldLabels[s.name as SpreadField] ?? s.name),
          marker: { color: rows.map((s) => (s.rankCorrelation < 0 ? plotPalette.over : plotPalette.quiet)) },
          text: rows.map((s) => `${s.rankCorrelation.toFixed(2)} (${s.direction === 'raises' ? 'raises' : s.direction === 'lowers' ? 'lowers' : 'no effect on'} the margin)`),
          textposition: 'auto',
          hovertemplate: '%{y}: %{x:.3f}<extra></extra>',
        },
      ]}
      layout={{
        margin: { l: 190, r: 16, t: 10, b: 48 },
        paper_bgcolor: plotPalette.paper,
        plot_bgcolor: plotPalette.paper,
        font: { family: plotPalette.font, color: plotPalette.ink, size: 12 },
        xaxis: { title: { text: 'Spearman rank correlation with the margin [-]' }, range: [-1, 1], gridcolor: plotPalette.grid, zerolinecolor: plotPalette.ink },
        yaxis: { automargin: true },
        showlegend: false,
      }}
    />
  );
}
