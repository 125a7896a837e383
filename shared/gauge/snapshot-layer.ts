import type { FluidLaws } from '../fluids/fluid-laws';
import type { LayerFields } from '../fluids/read-layer-input';
import { bottomSchema, heatingInputSchema, topKindSchema, type HeatingInput } from '../schemas/layer-checks';
import type { SheetSnapshot } from '../schemas/sheets';

/** The part of a sheet snapshot the gauge log needs to rebuild the released layer. */
export type GaugeSnapshot = Pick<SheetSnapshot, 'input' | 'results' | 'check'> & { fluid: Pick<SheetSnapshot['fluid'], 'kind'> };

/**
 * The released check's layer fields as frozen in a sheet snapshot (quantities as entered).
 *
 * ## Method
 * The snapshot keeps the check's input as text with units; the bottom, top and heating are read
 * back through the layer-check contract so that a snapshot with an unexpected shape fails loudly
 * instead of being judged with a guessed layer.
 *
 * @param snapshot - a signed sheet revision's snapshot
 * @returns the layer fields of the released check
 * @throws RangeError naming the snapshot field that cannot be read
 * @example snapshotLayerFields(snapshot).depth // "50 µm"
 */
export function snapshotLayerFields(snapshot: GaugeSnapshot): LayerFields {
  const input = snapshot.input;
  const bottom = bottomSchema.safeParse(input.bottom);
  const top = topKindSchema.safeParse(input.top);
  const heating = heatingInputSchema.safeParse(input.heating);
  if (!bottom.success) throw new RangeError('snapshot.input.bottom cannot be read as a layer bottom');
  if (!top.success) throw new RangeError('snapshot.input.top cannot be read as a layer top');
  if (!heating.success) throw new RangeError('snapshot.input.heating cannot be read as a heating description');
  return {
    processKind: snapshot.check.processKind,
    temperature: input.temperature,
    depth: input.depth,
    bottom: bottom.data,
    top: top.data,
    deformableSurface: input.deformableSurface,
    heating: heating.data as HeatingInput & LayerFields['heating'],
    lateral: null,
    panelWidth: null,
    soluteFractionDifference: null,
    alertThreshold: input.alertThreshold,
  };
}

/**
 * Fluid laws frozen at the snapshot's evaluation temperature: every property constant at the
 * value the signed sheet reports (results.properties), so that a reading is judged with exactly
 * the numbers that were released, never with later edits of the fluid.
 *
 * ## Method
 * T_ref = the evaluation temperature; ρ_ref, β, σ_ref, dσ/dT, k, c_p as stored; μ = A·exp(B/T)
 * with A = μ and B = 0 (constant). fluidPropertiesAt(laws, T_eval) then returns the snapshot's
 * properties (κ = k/(ρ c_p) recomputed). A consequence, documented for users: temperatures given
 * with a reading change the drive across the film, not the film's properties.
 *
 * @param snapshot - a signed sheet revision's snapshot
 * @returns laws that reproduce the snapshot's properties at its evaluation temperature [SI]
 * @example frozenFluidLaws(snapshot).viscosityActivationTemperature // 0
 */
export function frozenFluidLaws(snapshot: GaugeSnapshot): FluidLaws {
  const p = snapshot.results.properties;
  const t = snapshot.results.operatingPoint.temperature;
  return Object.freeze({
    kind: snapshot.fluid.kind as FluidLaws['kind'],
    referenceTemperature: t,
    validFrom: null,
    validTo: null,
    density: p.density,
    expansion: p.expansion,
    viscosityPreExponential: p.viscosity,
    viscosityActivationTemperature: 0,
    surfaceTension: p.surfaceTension,
    surfaceTensionSlope: p.surfaceTensionSlope,
    conductivity: p.conductivity,
    heatCapacity: p.heatCapacity,
    thermalDiffusivity: null,
    soluteDiffusivity: p.soluteDiffusivity,
    soluteSurfaceTensionSlope: p.soluteSurfaceTensionSlope,
  });
}
