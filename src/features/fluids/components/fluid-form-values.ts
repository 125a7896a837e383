import type { Distribution, Fluid, FluidInput, FluidKind, Property, PropertyInput } from '../../../../shared/schemas/fluids';
import type { QuantityKind } from '../../../../shared/units/quantity-kinds';

export interface PropertyFormValue {
  value: string;
  source: string;
  uncertaintyPercent: number;
  distribution: Distribution;
}

export interface FluidFormValues {
  name: string;
  kind: FluidKind;
  notes: string;
  referenceTemperature: string;
  validFrom: string;
  validTo: string;
  density: PropertyFormValue;
  expansion: PropertyFormValue;
  viscosity: {
    law: 'points' | 'andrade';
    points: { temperature: string; value: string }[];
    preExponential: string;
    activationTemperature: string;
    source: string;
    uncertaintyPercent: number;
    distribution: Distribution;
  };
  surfaceTension: PropertyFormValue;
  surfaceTensionSlope: PropertyFormValue;
  conductivity: PropertyFormValue;
  heatCapacity: PropertyFormValue;
  thermalDiffusivity: PropertyFormValue;
  soluteDiffusivity: PropertyFormValue;
  soluteSurfaceTensionSlope: PropertyFormValue;
}

export type PropertyKey =
  | 'density'
  | 'expansion'
  | 'surfaceTension'
  | 'surfaceTensionSlope'
  | 'conductivity'
  | 'heatCapacity'
  | 'thermalDiffusivity'
  | 'soluteDiffusivity'
  | 'soluteSurfaceTensionSlope';

export interface PropertyRow {
  key: PropertyKey;
  label: string;
  kinds: readonly QuantityKind[];
  example: string;
  optional: boolean;
  hint?: string;
}

/** The scalar properties in the order the form shows them. */
export const propertyRows: readonly PropertyRow[] = [
  { key: 'density', label: 'Density ρ', kinds: ['density'], example: '789 kg/m³', optional: false },
  { key: 'expansion', label: 'Thermal expansion β', kinds: ['expansion'], example: '1.09e-3 1/K', optional: false, hint: 'Volumetric; ρ(T) = ρ₀ (1 − β (T − T₀)).' },
  { key: 'surfaceTension', label: 'Surface tension σ', kinds: ['surfaceTension'], example: '35 dyn/cm', optional: false },
  { key: 'surfaceTensionSlope', label: 'dσ/dT', kinds: ['surfaceTensionSlope'], example: '-0.084 mN/(m·K)', optional: false, hint: 'Negative for most liquids: σ falls as T rises.' },
  { key: 'conductivity', label: 'Thermal conductivity k', kinds: ['conductivity'], example: '0.167 W/(m·K)', optional: false },
  { key: 'heatCapacity', label: 'Heat capacity cₚ', kinds: ['heatCapacity'], example: '2.44 kJ/(kg·K)', optional: true, hint: 'Give this or the thermal diffusivity.' },
  { key: 'thermalDiffusivity', label: 'Thermal diffusivity κ', kinds: ['diffusivity'], example: '8.7e-8 m²/s', optional: true, hint: 'Give this or the heat capacity.' },
  { key: 'soluteDiffusivity', label: 'Solute diffusivity D', kinds: ['diffusivity'], example: '1e-10 m²/s', optional: true, hint: 'For solutions: with dσ/dc it gives the solutal Marangoni number.' },
  { key: 'soluteSurfaceTensionSlope', label: 'dσ/dc', kinds: ['surfaceTension'], example: '15 mN/m', optional: true, hint: 'Per unit mass fraction of solvent.' },
];

const blankProperty = (): PropertyFormValue => ({ value: '', source: '', uncertaintyPercent: 0, distribution: 'normal' });

export function emptyFluidFormValues(): FluidFormValues {
  return {
    name: '',
    kind: 'solvent',
    notes: '',
    referenceTemperature: '20 °C',
    validFrom: '',
    validTo: '',
    density: blankProperty(),
    expansion: blankProperty(),
    viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '' }], preExponential: '', activationTemperature: '', source: '', uncertaintyPercent: 0, distribution: 'normal' },
    surfaceTension: blankProperty(),
    surfaceTensionSlope: blankProperty(),
    conductivity: blankProperty(),
    heatCapacity: blankProperty(),
    thermalDiffusivity: blankProperty(),
    soluteDiffusivity: blankProperty(),
    soluteSurfaceTensionSlope: blankProperty(),
  };
}

function propertyValues(property: Property | null): PropertyFormValue {
  if (!property) return blankProperty();
  return { value: property.value, source: property.source, uncertaintyPercent: property.uncertaintyPercent, distribution: property.distribution };
}

/** A stored fluid as form values: every quantity as it was typed, with its unit. */
export function fluidToFormValues(fluid: Fluid): FluidFormValues {
  return {
    name: fluid.name,
    kind: fluid.kind,
    notes: fluid.notes,
    referenceTemperature: fluid.referenceTemperature.value,
    validFrom: fluid.validFrom?.value ?? '',
    validTo: fluid.validTo?.value ?? '',
    density: propertyValues(fluid.density),
    expansion: propertyValues(fluid.expansion),
    viscosity: {
      law: fluid.viscosity.law,
      points: fluid.viscosity.points?.length ? fluid.viscosity.points : [{ temperature: fluid.referenceTemperature.value, value: '' }],
      preExponential: fluid.viscosity.preExponential ?? '',
      activationTemperature: fluid.viscosity.activationTemperature ?? '',
      source: fluid.viscosity.source,
      uncertaintyPercent: fluid.viscosity.uncertaintyPercent,
      distribution: fluid.viscosity.distribution,
    },
    surfaceTension: propertyValues(fluid.surfaceTension),
    surfaceTensionSlope: propertyValues(fluid.surfaceTensionSlope),
    conductivity: propertyValues(fluid.conductivity),
    heatCapacity: propertyValues(fluid.heatCapacity),
    thermalDiffusivity: propertyValues(fluid.thermalDiffusivity),
    soluteDiffusivity: propertyValues(fluid.soluteDiffusivity),
    soluteSurfaceTensionSlope: propertyValues(fluid.soluteSurfaceTensionSlope),
  };
}

const percent = (value: number) => (Number.isFinite(value) ? value : 0);

function propertyInput(value: PropertyFormValue): PropertyInput {
  return { value: value.value, source: value.source, uncertaintyPercent: percent(value.uncertaintyPercent), distribution: value.distribution };
}

/** An optional property left blank is not sent (a blank required one is, so the schema names it). */
function optionalProperty(value: PropertyFormValue): PropertyInput | undefined {
  return value.value.trim() ? propertyInput(value) : undefined;
}

/** Form values → the API body (shared/schemas/fluids.ts fluidInputSchema). */
export function formValuesToFluidInput(values: FluidFormValues): FluidInput {
  const viscosity = values.viscosity;
  const common = { source: viscosity.source, uncertaintyPercent: percent(viscosity.uncertaintyPercent), distribution: viscosity.distribution };
  return {
    name: values.name,
    kind: values.kind,
    notes: values.notes,
    referenceTemperature: values.referenceTemperature,
    validFrom: values.validFrom.trim() || undefined,
    validTo: values.validTo.trim() || undefined,
    density: propertyInput(values.density),
    expansion: propertyInput(values.expansion),
    viscosity:
      viscosity.law === 'points'
        ? { law: 'points', points: viscosity.points.map((point) => ({ temperature: point.temperature, value: point.value })), ...common }
        : { law: 'andrade', preExponential: viscosity.preExponential, activationTemperature: viscosity.activationTemperature, ...common },
    surfaceTension: propertyInput(values.surfaceTension),
    surfaceTensionSlope: propertyInput(values.surfaceTensionSlope),
    conductivity: propertyInput(values.conductivity),
    heatCapacity: optionalProperty(values.heatCapacity),
    thermalDiffusivity: optionalProperty(values.thermalDiffusivity),
    soluteDiffusivity: optionalProperty(values.soluteDiffusivity),
    soluteSurfaceTensionSlope: optionalProperty(values.soluteSurfaceTensionSlope),
  };
}
