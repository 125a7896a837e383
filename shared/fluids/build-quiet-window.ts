import { evaluateLayer } from '../physics/sizing/evaluate-layer';
import { quietWindow } from '../physics/sizing/quiet-window';
import type { QuietWindow } from '../schemas/layer-checks';
import { parseQuantity } from '../units/parse-quantity';
import type { FluidLaws } from './fluid-laws';
import { readLayerInput, type LayerFields } from './read-layer-input';

export type BuildQuietWindowResult = { ok: true; value: QuietWindow } | { ok: false; fields: Record<string, string> };

/**
 * The quiet window of a check: onset margin over depth × drive, with the onset boundaries.
 *
 * ## Method
 * The physics core's `quietWindow` samples depth (log-spaced) × ΔT and gives, per depth, the ΔT at
 * cellular onset, at long-wave onset and at onset of the most dangerous mode. When the check gives
 * heat as a flux (heat flux or evaporation load), the drive axis is the flux q and, since
 * ΔT = q d/k and the margin is inversely proportional to ΔT at fixed depth (the onset factor
 * scales Ra and Ma together), margin(q, d) = ΔT_onset(d)·k/(q d) and q_onset(d) = ΔT_onset(d)·k/d.
 * A flat surface (`deformableSurface` false) has no long-wave boundary. Sizing answers come from
 * `evaluateLayer` at the operating point.
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500; Nield D.A. (1964) J. Fluid Mech. 19:341–352.
 * - VanHook S.J. et al. (1997) J. Fluid Mech. 345:45–78 (long-wave branch).
 *
 * @param check - the layer fields of a check
 * @param laws - the fluid's laws [SI]
 * @param query - optional ranges as text, and grid points per axis
 * @returns the window (SI) or field errors keyed by input path (`window.depthMin`, …)
 */
export function buildQuietWindow(
  check: LayerFields,
  laws: FluidLaws,
  query: { depthMin?: string; depthMax?: string; driveMax?: string; points: number },
): BuildQuietWindowResult {
  const read = readLayerInput(check, laws);
  if (!read.ok) return read;
  const { layer, heatFlux, properties } = read.value;
  const byFlux = heatFlux !== null;
  const fields: Record<string, string> = {};
  const parse = (path: string, text: string | undefined, kind: 'length' | 'heatFlux' | 'temperatureDifference'): number | null => {
    if (text === undefined) return null;
    try {
      return parseQuantity(text, kind);
    } catch (error) {
      fields[path] = (error as Error).message;
      return null;
    }
  };
  const depthMin = parse('window.depthMin', query.depthMin, 'length') ?? layer.depth / 5;
  const depthMax = parse('window.depthMax', query.depthMax, 'length') ?? layer.depth * 5;
  const presentDrive = byFlux ? (heatFlux as number) : layer.deltaT;
  const driveMax =
    parse('window.driveMax', query.driveMax, byFlux ? 'heatFlux' : 'temperatureDifference') ??
    (Math.abs(presentDrive) > 0 ? 3 * Math.abs(presentDrive) : byFlux ? 1000 : 10);
  if (!(depthMin > 0)) fields['window.depthMin'] = 'depthMin must be > 0';
  if (!(depthMax > depthMin)) fields['window.depthMax'] = 'depthMax must be above depthMin';
  if (!(driveMax > 0)) fields['window.driveMax'] = 'driveMax must be > 0';
  if (Object.keys(fields).length > 0) return { ok: false, fields };

  const points = query.points;
  const drives = Array.from({ length: points }, (_, i) => (driveMax * (i + 1)) / points);
  const deltaTMaxNeeded = byFlux ? (driveMax * depthMax) / properties.conductivity : driveMax;
  let window;
  let evaluation;
  try {
    window = quietWindow(layer, {
      depthMin,
      depthMax,
      deltaTMin: byFlux ? deltaTMaxNeeded / points : drives[0],
      deltaTMax: deltaTMaxNeeded,
      depthPoints: points,
      deltaTPoints: points,
    });
    evaluation = evaluateLayer(layer);
  } catch (error) {
    return { ok: false, fields: { _: (error as Error).message } };
  }
  const deformable = check.top === 'surface' && check.deformableSurface;
  const onsetDeltaT = deformable ? window.onsetDeltaT : window.cellOnsetDeltaT;
  const k = properties.conductivity;
  const toDrive = (dT: number | null, depth: number) => (dT === null ? null : byFlux ? (dT * k) / depth : dT);
  const margin = byFlux
    ? drives.map((q) => window.depths.map((d, j) => {
        const onset = onsetDeltaT[j];
        return onset === null ? null : (onset * k) / (q * d);
      }))
    : deformable
      ? window.margin
      : drives.map((dT) => window.depths.map((_d, j) => (onsetDeltaT[j] === null ? null : (onsetDeltaT[j] as number) / dT)));
  const finite = (x: number) => (Number.isFinite(x) ? x : null);
  return {
    ok: true,
    value: {
      driveKind: byFlux ? 'heat-flux' : 'deltaT',
      depths: window.depths,
      drives: byFlux ? drives : window.deltaTs,
      margin,
      cellBoundary: window.depths.map((d, j) => toDrive(window.cellOnsetDeltaT[j], d)),
      longWaveBoundary: deformable ? window.depths.map((d, j) => toDrive(window.longWaveOnsetDeltaT[j], d)) : window.depths.map(() => null),
      operatingPoint: { depth: layer.depth, drive: presentDrive },
      sizing: {
        maxStableDepth: evaluation.maxStableDepth.found ? evaluation.maxStableDepth.depth : null,
        minStableDepth: deformable && evaluation.minStableDepth.found ? evaluation.minStableDepth.depth : null,
        maxDeltaT: finite(deformable ? evaluation.maxDeltaT.mostDangerous : evaluation.maxDeltaT.cellular),
      },
    },
  };
}
