import { buildQuietWindow } from '../../../shared/fluids/build-quiet-window';
import { evaluateLayerCheck } from '../../../shared/fluids/evaluate-layer-check';
import type { FluidLaws } from '../../../shared/fluids/fluid-laws';
import type { Property, ViscosityLaw } from '../../../shared/schemas/fluids';
import { layerCheckInputSchema, type LayerCheckInputParsed } from '../../../shared/schemas/layer-checks';
import { SOLVER_VERSION } from '../../../shared/physics/version';
import type { SheetSnapshot, SnapshotProperty } from '../../../shared/schemas/sheets';
import type { FluidDefinition } from '../../db/schema/fluids';
import { UnprocessableError } from '../../errors';
import { SHEET_SITE } from './sheet-site';

export interface SnapshotSource {
  check: { id: string; title: string; processKind: LayerCheckInputParsed['processKind'] };
  revision: { revision: number; input: unknown; savedAt: Date; savedByName: string | null };
  fluid: { id: string; name: string; kind: string; archived: boolean; definition: FluidDefinition; laws: FluidLaws };
}

/** Grid points per axis of the quiet window stored with a sheet (the figure draws its boundaries). */
const WINDOW_POINTS = 40;

const propertyRows: [keyof FluidDefinition, string][] = [
  ['density', 'Density ρ'],
  ['expansion', 'Expansion coefficient β'],
  ['surfaceTension', 'Surface tension σ'],
  ['surfaceTensionSlope', 'dσ/dT'],
  ['conductivity', 'Thermal conductivity k'],
  ['heatCapacity', 'Heat capacity c_p'],
  ['thermalDiffusivity', 'Thermal diffusivity κ'],
  ['soluteDiffusivity', 'Solute diffusivity D'],
  ['soluteSurfaceTensionSlope', 'dσ/dc'],
];

function viscosityRow(law: ViscosityLaw): SnapshotProperty {
  const value =
    law.law === 'points'
      ? (law.points ?? []).map((p) => `${p.value} at ${p.temperature}`).join('; ')
      : `μ = A·exp(B/T), A = ${law.preExponential}, B = ${law.activationTemperature}`;
  const constant = law.fitActivationTemperature === 0;
  return {
    key: 'viscosity',
    label: 'Viscosity μ',
    value,
    si: constant ? law.fitPreExponential : null,
    siUnit: constant ? 'Pa·s' : '',
    source: law.source,
    uncertaintyPercent: law.uncertaintyPercent,
  };
}

function fail(message: string, fields: Record<string, string>): never {
  throw new UnprocessableError(message, fields);
}

/**
 * Freezes what a Process sheet shows: the check revision's input as entered, the fluid's
 * properties as entered (value, unit, source, uncertainty), the evaluation and the quiet window
 * computed now, and the solver version. The sheet's PDF is drawn from this snapshot alone, so it
 * reads the same after the fluid or the solver changes.
 */
export function buildSheetSnapshot(source: SnapshotSource): SheetSnapshot {
  const parsed = layerCheckInputSchema.safeParse(source.revision.input);
  if (!parsed.success) {
    fail(`Revision ${source.revision.revision} of this layer check cannot be read any more; save the check again.`, { checkRevision: 'unreadable check revision' });
  }
  const input = parsed.data;
  const evaluated = evaluateLayerCheck(input, source.fluid.laws, { archived: source.fluid.archived });
  if (!evaluated.ok) {
    const [path, message] = Object.entries(evaluated.fields)[0];
    fail(`The layer check cannot be evaluated: ${path}: ${message}`, evaluated.fields);
  }
  const window = buildQuietWindow(input, source.fluid.laws, { points: WINDOW_POINTS });
  if (!window.ok) {
    const [path, message] = Object.entries(window.fields)[0];
    fail(`The quiet window of this check cannot be computed: ${path}: ${message}`, window.fields);
  }
  const { margin: _grid, ...windowBoundaries } = window.value;
  const definition = source.fluid.definition;
  const properties: SnapshotProperty[] = [];
  for (const [key, label] of propertyRows) {
    const property = definition[key] as Property | null | undefined;
    if (!property || typeof property !== 'object' || !('value' in property)) continue;
    properties.push({
      key,
      label,
      value: property.value,
      si: property.si,
      siUnit: property.siUnit,
      source: property.source,
      uncertaintyPercent: property.uncertaintyPercent,
    });
    if (key === 'expansion') properties.push(viscosityRow(definition.viscosity));
  }
  const snapshot: SheetSnapshot = {
    format: 1,
    solverVersion: SOLVER_VERSION,
    site: { ...SHEET_SITE },
    check: {
      id: source.check.id,
      title: source.check.title,
      notes: input.notes,
      revision: source.revision.revision,
      savedAt: source.revision.savedAt.toISOString(),
      savedByName: source.revision.savedByName,
      processKind: input.processKind,
    },
    input: {
      temperature: input.temperature,
      depth: input.depth,
      bottom: input.bottom,
      top: input.top,
      deformableSurface: input.deformableSurface,
      heating: Object.fromEntries(Object.entries(input.heating).filter(([, v]) => typeof v === 'string')) as Record<string, string>,
      lateral: input.lateral ?? null,
      panelWidth: input.panelWidth ?? null,
      soluteFractionDifference: input.soluteFractionDifference ?? null,
      alertThreshold: input.alertThreshold,
    },
    fluid: {
      id: source.fluid.id,
      name: source.fluid.name,
      kind: source.fluid.kind,
      referenceTemperature: definition.referenceTemperature.value,
      validRange: definition.validFrom && definition.validTo ? `${definition.validFrom.value} to ${definition.validTo.value}` : null,
      properties,
    },
    results: evaluated.value,
    window: windowBoundaries,
  };
  // One JSON form (no undefined, no -0 surprises) so the stored snapshot and the rendered one agree.
  return JSON.parse(JSON.stringify(snapshot)) as SheetSnapshot;
}
