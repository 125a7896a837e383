import type { MeltPoolSetup } from '../../../shared/schemas/melt-pool';
import { formatSignificant } from '../../../shared/units/format-significant';
import type { SheetSection } from '../drying-paths/drying-sheet-section';

const sig = (x: number, d = 3) => formatSignificant(x, d);

/**
 * The Melt pool flow section of a process sheet, from a stored melt-pool set-up (no physics re-run).
 * Pure. Rows: flow direction and pool shape, σ and dσ/dT at edge and peak, the sign change, Ma, u,
 * Pe, the two heats with their sulfur; paragraphs: the direction in words and the sulfur warnings;
 * cautions: the welding cautions, ending with the scope statement.
 */
export function meltPoolSheetSection(setup: MeltPoolSetup): SheetSection {
  const r = setup.result;
  const c = setup.comparison;
  return {
    title: 'Melt pool flow',
    rows: [
      { label: 'Surface flow', value: `${r.direction} (${r.poolShape.replace('-', ', ')} pool tendency)` },
      { label: 'σ at pool edge / peak', value: `${sig(r.surfaceTensionAtEdge * 1e3, 4)} / ${sig(r.surfaceTensionAtPeak * 1e3, 4)} mN/m` },
      { label: 'dσ/dT at pool edge / peak', value: `${sig(r.slopeAtEdge * 1e3)} / ${sig(r.slopeAtPeak * 1e3)} mN/(m·K)` },
      { label: 'dσ/dT = 0 at', value: r.signChangeTemperature !== null ? `${Math.round(r.signChangeTemperature)} K (inside the pool)` : r.signChangeTemperatureWide !== null ? `${Math.round(r.signChangeTemperatureWide)} K (outside the pool)` : 'nowhere from 1000 K to 3000 K' },
      { label: 'Marangoni number / velocity scale / Péclet number', value: `${sig(r.marangoniNumber)} / ${sig(r.surfaceVelocity)} m/s / ${sig(r.pecletNumber)}` },
      ...c.parts.map((p, i) => ({ label: i === 0 ? 'First heat' : 'Second heat', value: `${p.heatNumber}: ${sig(p.sulfurPpm)} ppm S, flow ${p.flowDirection} at ${Math.round(c.poolTemperature)} K` })),
    ],
    paragraphs: [r.directionText, ...c.warnings.map((w) => w.message), ...r.warnings],
    cautions: r.cautions.map((caution) => `${caution.title}: ${caution.text}`),
  };
}
