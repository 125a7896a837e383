/**
 * Test fixtures: made-up released checks as a signed sheet would freeze them. The results are
 * produced by the layer-check evaluation (the physics core), never by the gauge code under test.
 */
import { evaluateLayerCheck } from '../fluids/evaluate-layer-check';
import type { FluidLaws } from '../fluids/fluid-laws';
import type { LayerFields } from '../fluids/read-layer-input';
import type { GaugeSnapshot } from './snapshot-layer';

/**
 * Round-number fluid: μ = 10 mPa·s, k = 0.1 W/(m·K), ρ = 1000 kg/m³, c_p = 1000 J/(kg·K)
 * → κ = 1e-7 m²/s; dσ/dT = −0.1 mN/(m·K); β = 0. For d = 1 mm, Ma = 100·ΔT (hand calculation).
 */
export const roundFluidLaws: FluidLaws = Object.freeze({
  kind: 'other',
  referenceTemperature: 293.15,
  validFrom: null,
  validTo: null,
  density: 1000,
  expansion: 0,
  viscosityPreExponential: 0.01,
  viscosityActivationTemperature: 0,
  surfaceTension: 0.03,
  surfaceTensionSlope: -1e-4,
  conductivity: 0.1,
  heatCapacity: 1000,
  thermalDiffusivity: null,
  soluteDiffusivity: null,
  soluteSurfaceTensionSlope: null,
});

/** A primer-like solvent film with buoyancy (β > 0) and a temperature-dependent viscosity. */
export const primerFluidLaws: FluidLaws = Object.freeze({
  kind: 'solution',
  referenceTemperature: 293.15,
  validFrom: null,
  validTo: null,
  density: 1100,
  expansion: 1e-3,
  viscosityPreExponential: 2e-6,
  viscosityActivationTemperature: 2000,
  surfaceTension: 0.028,
  surfaceTensionSlope: -9e-5,
  conductivity: 0.16,
  heatCapacity: 1900,
  thermalDiffusivity: null,
  soluteDiffusivity: null,
  soluteSurfaceTensionSlope: null,
});

/** Pearson's layer at onset for d = 1 mm: rigid conducting bottom, flat insulating free surface, Ma = 79.607. */
export const pearsonFields: LayerFields = {
  processKind: 'general-layer',
  temperature: '20 °C',
  depth: '1 mm',
  bottom: { mechanics: 'rigid', thermal: 'conducting' },
  top: 'surface',
  deformableSurface: false,
  heating: { mode: 'deltaT', deltaT: '0.79607 K' },
  lateral: null,
  panelWidth: null,
  soluteFractionDifference: null,
  alertThreshold: 1.25,
};

/** Build the parts of a sheet snapshot the gauge log reads, from a check and its fluid laws. */
export function snapshotOf(fields: LayerFields, laws: FluidLaws): GaugeSnapshot {
  const evaluated = evaluateLayerCheck(fields, laws);
  if (!evaluated.ok) throw new Error(`fixture check does not evaluate: ${JSON.stringify(evaluated.fields)}`);
  return {
    check: {
      id: '00000000-0000-4000-8000-000000000001',
      title: 'Fixture check',
      notes: '',
      revision: 1,
      savedAt: '2026-01-01T00:00:00.000Z',
      savedByName: null,
      processKind: fields.processKind,
    },
    input: {
      temperature: fields.temperature,
      depth: fields.depth,
      bottom: fields.bottom,
      top: fields.top,
      deformableSurface: fields.deformableSurface ?? true,
      heating: fields.heating as Record<string, string>,
      lateral: null,
      panelWidth: null,
      soluteFractionDifference: null,
      alertThreshold: fields.alertThreshold ?? 1.25,
    },
    fluid: { kind: laws.kind },
    results: evaluated.value,
  };
}
