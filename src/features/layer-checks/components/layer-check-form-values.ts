import type { EvaluateLayerCheckInput, HeatingInput, HeatingMode, LayerCheck, LayerCheckInput, ProcessKind, TopKindInput } from '../../../../shared/schemas/layer-checks';
import { processKindPresets } from '../../../../shared/fluids/process-kind-presets';

/** Flat form values: one field per input box, so each server error has a place to sit. */
export interface LayerCheckFormValues {
  title: string;
  fluidId: string;
  notes: string;
  processKind: ProcessKind;
  temperature: string;
  depth: string;
  bottomMechanics: 'rigid' | 'free';
  bottomThermal: 'conducting' | 'insulating';
  top: TopKindInput;
  deformableSurface: boolean;
  heatingMode: HeatingMode;
  deltaT: string;
  substrateTemperature: string;
  airTemperature: string;
  heatTransferCoefficient: string;
  heatFlux: string;
  evaporationRate: string;
  latentHeat: string;
  lateralOn: boolean;
  lateralDeltaT: string;
  lateralDistance: string;
  panelWidth: string;
  soluteFractionDifference: string;
  alertThreshold: string;
}

export type LayerCheckField = keyof LayerCheckFormValues;

/** A new check starts as a Larkspur-style drying coat: 50 µm wet on a steel web. */
export function emptyLayerCheckValues(fluidId = ''): LayerCheckFormValues {
  const preset = processKindPresets['drying-coat'];
  return {
    title: '',
    fluidId,
    notes: '',
    processKind: 'drying-coat',
    temperature: '40 °C',
    depth: '50 µm',
    bottomMechanics: preset.bottom.mechanics,
    bottomThermal: preset.bottom.thermal,
    top: preset.top,
    deformableSurface: preset.deformableSurface,
    heatingMode: preset.heatingMode,
    deltaT: '2 K',
    substrateTemperature: '70 °C',
    airTemperature: '25 °C',
    heatTransferCoefficient: '25 W/(m²·K)',
    heatFlux: '1 kW/m²',
    evaporationRate: '1 g/(m²·s)',
    latentHeat: '850 kJ/kg',
    lateralOn: false,
    lateralDeltaT: '2 K',
    lateralDistance: '50 mm',
    panelWidth: '600 mm',
    soluteFractionDifference: '',
    alertThreshold: '1.25',
  };
}

/** The preset of a process kind applied to the values (boundaries and heating mode), the rest kept. */
export function applyProcessKindPreset(values: LayerCheckFormValues, kind: ProcessKind): LayerCheckFormValues {
  const preset = processKindPresets[kind];
  return {
    ...values,
    processKind: kind,
    bottomMechanics: preset.bottom.mechanics,
    bottomThermal: preset.bottom.thermal,
    top: preset.top,
    deformableSurface: preset.deformableSurface,
    heatingMode: preset.heatingMode,
  };
}

/** A stored check as form values; boxes the check does not use keep a sensible example. */
export function layerCheckToValues(check: LayerCheck): LayerCheckFormValues {
  const base = emptyLayerCheckValues(check.fluidId);
  const heating = check.heating;
  return {
    ...base,
    title: check.title,
    notes: check.notes,
    processKind: check.processKind,
    temperature: check.temperature,
    depth: check.depth,
    bottomMechanics: check.bottom.mechanics,
    bottomThermal: check.bottom.thermal,
    top: check.top,
    deformableSurface: check.deformableSurface,
    heatingMode: heating.mode,
    deltaT: heating.mode === 'deltaT' ? heating.deltaT : base.deltaT,
    substrateTemperature: heating.mode === 'substrate-air' ? heating.substrateTemperature : base.substrateTemperature,
    airTemperature: heating.mode === 'substrate-air' ? heating.airTemperature : base.airTemperature,
    heatTransferCoefficient: heating.heatTransferCoefficient ?? (heating.mode === 'substrate-air' ? base.heatTransferCoefficient : ''),
    heatFlux: heating.mode === 'heat-flux' ? heating.heatFlux : base.heatFlux,
    evaporationRate: heating.mode === 'evaporation' ? heating.evaporationRate : base.evaporationRate,
    latentHeat: heating.mode === 'evaporation' ? heating.latentHeat : base.latentHeat,
    lateralOn: check.lateral !== null,
    lateralDeltaT: check.lateral?.deltaT ?? base.lateralDeltaT,
    lateralDistance: check.lateral?.distance ?? base.lateralDistance,
    panelWidth: check.panelWidth ?? '',
    soluteFractionDifference: check.soluteFractionDifference === null ? '' : String(check.soluteFractionDifference),
    alertThreshold: String(check.alertThreshold),
  };
}

const optionalText = (text: string) => (text.trim() ? text.trim() : undefined);

function heatingInput(values: LayerCheckFormValues): HeatingInput {
  const h = optionalText(values.heatTransferCoefficient);
  switch (values.heatingMode) {
    case 'deltaT':
      return { mode: 'deltaT', deltaT: values.deltaT, ...(h ? { heatTransferCoefficient: h } : {}) };
    case 'substrate-air':
      return { mode: 'substrate-air', substrateTemperature: values.substrateTemperature, airTemperature: values.airTemperature, heatTransferCoefficient: values.heatTransferCoefficient };
    case 'heat-flux':
      return { mode: 'heat-flux', heatFlux: values.heatFlux, ...(h ? { heatTransferCoefficient: h } : {}) };
    case 'evaporation':
      return { mode: 'evaporation', evaporationRate: values.evaporationRate, latentHeat: values.latentHeat, ...(h ? { heatTransferCoefficient: h } : {}) };
  }
}

/** A number box: blank → null; otherwise the number (NaN is left for the schema to name). */
function numberOrNull(text: string): number | null {
  return text.trim() === '' ? null : Number(text.trim());
}

/** Form values → the body of save (shared/schemas/layer-checks.ts layerCheckInputSchema). */
export function valuesToLayerCheckInput(values: LayerCheckFormValues): LayerCheckInput {
  const threshold = numberOrNull(values.alertThreshold);
  return {
    title: values.title,
    fluidId: values.fluidId,
    notes: values.notes,
    processKind: values.processKind,
    temperature: values.temperature,
    depth: values.depth,
    bottom: { mechanics: values.bottomMechanics, thermal: values.bottomThermal },
    top: values.top,
    deformableSurface: values.top === 'surface' ? values.deformableSurface : false,
    heating: heatingInput(values),
    lateral: values.lateralOn ? { deltaT: values.lateralDeltaT, distance: values.lateralDistance } : null,
    panelWidth: optionalText(values.panelWidth) ?? null,
    soluteFractionDifference: numberOrNull(values.soluteFractionDifference),
    ...(threshold === null ? {} : { alertThreshold: threshold }),
  };
}

/** The body of the live evaluation, or undefined while there is nothing to evaluate yet (no fluid, no depth). */
export function valuesToEvaluationInput(values: LayerCheckFormValues): EvaluateLayerCheckInput | undefined {
  if (!values.fluidId || !values.depth.trim() || !values.temperature.trim()) return undefined;
  const { title: _title, notes: _notes, ...rest } = valuesToLayerCheckInput(values);
  return rest;
}

/** Where a server error path ("heating.deltaT", "lateral.distance") sits in the form. */
export function fieldForInputPath(path: string): LayerCheckField | undefined {
  const direct: Record<string, LayerCheckField> = {
    title: 'title',
    fluidId: 'fluidId',
    fluid: 'fluidId',
    notes: 'notes',
    processKind: 'processKind',
    temperature: 'temperature',
    depth: 'depth',
    'bottom.mechanics': 'bottomMechanics',
    'bottom.thermal': 'bottomThermal',
    bottom: 'bottomMechanics',
    top: 'top',
    deformableSurface: 'deformableSurface',
    heating: 'heatingMode',
    'heating.mode': 'heatingMode',
    'heating.deltaT': 'deltaT',
    'heating.substrateTemperature': 'substrateTemperature',
    'heating.airTemperature': 'airTemperature',
    'heating.heatTransferCoefficient': 'heatTransferCoefficient',
    'heating.heatFlux': 'heatFlux',
    'heating.evaporationRate': 'evaporationRate',
    'heating.latentHeat': 'latentHeat',
    lateral: 'lateralDeltaT',
    'lateral.deltaT': 'lateralDeltaT',
    'lateral.distance': 'lateralDistance',
    panelWidth: 'panelWidth',
    soluteFractionDifference: 'soluteFractionDifference',
    alertThreshold: 'alertThreshold',
  };
  return direct[path];
}
