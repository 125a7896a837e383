import type { ReadFluid } from '../../../shared/fluids/read-fluid-input';
import { fluidPropertiesAt } from '../../../shared/fluids/fluid-properties-at';
import type { Fluid, FluidInput, FluidSummary, Property } from '../../../shared/schemas/fluids';
import type { FluidDefinition } from '../../db/schema/fluids';
import type { FluidRow, NewFluidRow } from './fluids.repository';

/** The columns a read fluid fills (everything except id, version, audit columns). */
export function fluidColumns(fluid: ReadFluid): Omit<NewFluidRow, 'id' | 'createdBy' | 'createdAt' | 'updatedAt' | 'version'> {
  const { name, kind, notes, laws, ...definition } = fluid;
  return {
    name,
    kind,
    notes,
    definition,
    laws,
    referenceTemperature: laws.referenceTemperature,
    density: laws.density,
    viscosityAtReference: fluidPropertiesAt(laws, laws.referenceTemperature).viscosity,
    surfaceTension: laws.surfaceTension,
    surfaceTensionSlope: laws.surfaceTensionSlope,
  };
}

/** Row → API contract. */
export function toFluid(row: FluidRow, checkCount: number): Fluid {
  const d: FluidDefinition = row.definition;
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    notes: row.notes,
    referenceTemperature: d.referenceTemperature,
    validFrom: d.validFrom,
    validTo: d.validTo,
    density: d.density,
    expansion: d.expansion,
    viscosity: d.viscosity,
    surfaceTension: d.surfaceTension,
    surfaceTensionSlope: d.surfaceTensionSlope,
    conductivity: d.conductivity,
    heatCapacity: d.heatCapacity,
    thermalDiffusivity: d.thermalDiffusivity,
    soluteDiffusivity: d.soluteDiffusivity,
    soluteSurfaceTensionSlope: d.soluteSurfaceTensionSlope,
    archived: row.archived,
    checkCount,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toFluidSummary(row: FluidRow): FluidSummary {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    archived: row.archived,
    referenceTemperature: row.referenceTemperature,
    density: row.density,
    viscosity: row.viscosityAtReference,
    surfaceTension: row.surfaceTension,
    surfaceTensionSlope: row.surfaceTensionSlope,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
  };
}

const propertyInput = (p: Property) => ({
  value: p.value,
  source: p.source,
  uncertaintyPercent: p.uncertaintyPercent,
  distribution: p.distribution,
});

/** A stored fluid back as the input that makes it (for duplicate and CSV export). */
export function fluidInputOf(row: FluidRow): FluidInput {
  const d = row.definition;
  const v = d.viscosity;
  const common = { source: v.source, uncertaintyPercent: v.uncertaintyPercent, distribution: v.distribution };
  return {
    name: row.name,
    kind: row.kind,
    notes: row.notes,
    referenceTemperature: d.referenceTemperature.value,
    ...(d.validFrom ? { validFrom: d.validFrom.value } : {}),
    ...(d.validTo ? { validTo: d.validTo.value } : {}),
    density: propertyInput(d.density),
    expansion: propertyInput(d.expansion),
    viscosity:
      v.law === 'andrade'
        ? { law: 'andrade', preExponential: v.preExponential ?? '', activationTemperature: v.activationTemperature ?? '', ...common }
        : { law: 'points', points: v.points ?? [], ...common },
    surfaceTension: propertyInput(d.surfaceTension),
    surfaceTensionSlope: propertyInput(d.surfaceTensionSlope),
    conductivity: propertyInput(d.conductivity),
    ...(d.heatCapacity ? { heatCapacity: propertyInput(d.heatCapacity) } : {}),
    ...(d.thermalDiffusivity ? { thermalDiffusivity: propertyInput(d.thermalDiffusivity) } : {}),
    ...(d.soluteDiffusivity ? { soluteDiffusivity: propertyInput(d.soluteDiffusivity) } : {}),
    ...(d.soluteSurfaceTensionSlope ? { soluteSurfaceTensionSlope: propertyInput(d.soluteSurfaceTensionSlope) } : {}),
  };
}
