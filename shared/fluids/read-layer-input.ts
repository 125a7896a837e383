import { baseStateDeltaT } from '../physics/base-state/base-state-delta-t';
import type { Heating } from '../physics/base-state/heating';
import type { PhysicalLayer } from '../physics/sizing/types';
import type { HeatingInput, LayerCheckInputParsed } from '../schemas/layer-checks';
import { STANDARD_GRAVITY } from '../units/constants';
import { parseQuantity } from '../units/parse-quantity';
import type { QuantityKind } from '../units/quantity-kinds';
import type { FluidLaws, FluidPropertiesAt } from './fluid-laws';
import { fluidPropertiesAt } from './fluid-properties-at';

/** The layer-describing part of a check (what evaluate needs besides the fluid). */
export type LayerFields = Pick<
  LayerCheckInputParsed,
  'processKind' | 'temperature' | 'depth' | 'bottom' | 'top' | 'deformableSurface' | 'heating' | 'lateral' | 'panelWidth' |
  'soluteFractionDifference' | 'alertThreshold'
>;

/** A check read into SI and mapped onto the physics core's layer. */
export interface ReadLayer {
  readonly layer: PhysicalLayer;
  readonly properties: FluidPropertiesAt;
  /** Evaluation temperature [K]. */
  readonly temperature: number;
  /** Heat flux through the layer [W/m²] when heat is given as a flux or evaporation load, else null. */
  readonly heatFlux: number | null;
  /** Top heat-transfer coefficient [W/(m²·K)] when given, else null. */
  readonly heatTransferCoefficient: number | null;
  readonly lateral: { readonly deltaT: number; readonly distance: number } | null;
  /** [m] or null */
  readonly panelWidth: number | null;
}

export type ReadLayerResult = { ok: true; value: ReadLayer } | { ok: false; fields: Record<string, string> };

/**
 * Read a layer check's text quantities into SI and build the physics core's {@link PhysicalLayer}
 * with the fluid's properties at the evaluation temperature.
 *
 * ## Method
 * Each quantity is read with `parseQuantity` for its kind (temperatures absolute, ΔT as a
 * difference). The temperature drop across the liquid comes from the heating description through
 * the physics core's `baseStateDeltaT`: ΔT itself; (T_b − T_a)·Bi/(1 + Bi) for plate and air;
 * q d/k for a heat flux; ṁ L d/k for an evaporation load. The top heat-transfer coefficient (0 when
 * not given: an insulating top, Bi = 0) sets the Biot number. Gravity is standard gravity.
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500 (Biot top condition).
 * - Bergman T.L. et al. (2011) Fundamentals of Heat and Mass Transfer, 7th ed., ch. 3 (series resistances).
 * - 3rd CGPM (1901): standard gravity 9.80665 m/s².
 *
 * @param check - the layer fields of a check (parsed by the shared zod schema)
 * @param laws - the fluid's laws [SI]
 * @returns the physical layer and the SI inputs, or field errors keyed by dotted input path
 * @example readLayerInput(check, water).value.layer.depth // 5e-5 for depth "50 µm"
 */
export function readLayerInput(check: LayerFields, laws: FluidLaws): ReadLayerResult {
  const fields: Record<string, string> = {};
  const read = (path: string, text: string, kind: QuantityKind): number | null => {
    try {
      return parseQuantity(text, kind);
    } catch (error) {
      fields[path] = (error as Error).message;
      return null;
    }
  };
  const positive = (path: string, value: number | null, max: number, what: string, unit: string): number | null => {
    if (value === null) return null;
    if (!(value > 0) || value > max) {
      fields[path] = `${what} must be > 0 and ≤ ${max} ${unit}; got ${value.toPrecision(4)} ${unit}`;
      return null;
    }
    return value;
  };

  const temperature = read('temperature', check.temperature, 'temperature');
  const depth = positive('depth', read('depth', check.depth, 'length'), 1, 'depth', 'm');
  const { heating, heatTransfer, heatFlux } = readHeating(check.heating, read, positive, fields);
  let lateral: ReadLayer['lateral'] = null;
  if (check.lateral) {
    const dT = read('lateral.deltaT', check.lateral.deltaT, 'temperatureDifference');
    const distance = positive('lateral.distance', read('lateral.distance', check.lateral.distance, 'length'), 100, 'lateral distance', 'm');
    if (dT !== null && distance !== null) lateral = { deltaT: dT, distance };
  }
  const panelWidth = check.panelWidth
    ? positive('panelWidth', read('panelWidth', check.panelWidth, 'length'), 100, 'panel width', 'm')
    : null;

  let properties: FluidPropertiesAt | null = null;
  if (temperature !== null) {
    try {
      properties = fluidPropertiesAt(laws, temperature);
    } catch (error) {
      fields.temperature = (error as Error).message;
    }
  }
  if (Object.keys(fields).length > 0 || temperature === null || depth === null || heating === null || properties === null) {
    if (Object.keys(fields).length === 0) fields._ = 'the layer could not be read';
    return { ok: false, fields };
  }
  let deltaT: number;
  try {
    deltaT = baseStateDeltaT(heating, { depth, conductivity: properties.conductivity });
  } catch (error) {
    return { ok: false, fields: { heating: (error as Error).message } };
  }
  const layer: PhysicalLayer = Object.freeze({
    bottom: check.bottom.mechanics,
    bottomThermal: check.bottom.thermal,
    top: check.top,
    density: properties.density,
    viscosity: properties.viscosity,
    conductivity: properties.conductivity,
    heatCapacity: properties.heatCapacity,
    expansion: properties.expansion,
    surfaceTension: properties.surfaceTension,
    dSigmaDT: properties.surfaceTensionSlope,
    depth,
    deltaT,
    heatTransfer: heatTransfer ?? 0,
    gravity: STANDARD_GRAVITY,
  });
  return {
    ok: true,
    value: {
      layer,
      properties,
      temperature,
      heatFlux,
      heatTransferCoefficient: heatTransfer,
      lateral,
      panelWidth,
    },
  };
}

function readHeating(
  heating: HeatingInput,
  read: (path: string, text: string, kind: QuantityKind) => number | null,
  positive: (path: string, value: number | null, max: number, what: string, unit: string) => number | null,
  fields: Record<string, string>,
): { heating: Heating | null; heatTransfer: number | null; heatFlux: number | null } {
  const h = (text: string | undefined, required: boolean): number | null => {
    if (text === undefined) {
      if (required) fields['heating.heatTransferCoefficient'] = 'heat-transfer coefficient is required for substrate and air temperatures';
      return null;
    }
    const value = read('heating.heatTransferCoefficient', text, 'heatTransferCoefficient');
    if (value !== null && !(value >= 0 && value <= 1e6)) {
      fields['heating.heatTransferCoefficient'] = `heat-transfer coefficient must be ≥ 0 and ≤ 10⁶ W/(m²·K); got ${value.toPrecision(4)} W/(m²·K)`;
      return null;
    }
    return value;
  };
  switch (heating.mode) {
    case 'deltaT': {
      const dT = read('heating.deltaT', heating.deltaT, 'temperatureDifference');
      if (dT !== null && Math.abs(dT) > 5000) fields['heating.deltaT'] = `ΔT must lie within ±5000 K; got ${dT.toPrecision(4)} K`;
      const hv = h(heating.heatTransferCoefficient, false);
      return { heating: dT === null ? null : { kind: 'deltaT', deltaT: dT }, heatTransfer: hv, heatFlux: null };
    }
    case 'substrate-air': {
      const tb = read('heating.substrateTemperature', heating.substrateTemperature, 'temperature');
      const ta = read('heating.airTemperature', heating.airTemperature, 'temperature');
      const hv = h(heating.heatTransferCoefficient, true);
      if (tb === null || ta === null || hv === null) return { heating: null, heatTransfer: hv, heatFlux: null };
      return { heating: { kind: 'surfaceTemperatures', substrateTemperature: tb, airTemperature: ta, heatTransfer: hv }, heatTransfer: hv, heatFlux: null };
    }
    case 'heat-flux': {
      const q = read('heating.heatFlux', heating.heatFlux, 'heatFlux');
      if (q !== null && Math.abs(q) > 1e9) fields['heating.heatFlux'] = `heat flux must lie within ±10⁹ W/m²; got ${q.toPrecision(4)} W/m²`;
      const hv = h(heating.heatTransferCoefficient, false);
      return { heating: q === null ? null : { kind: 'heatFlux', heatFlux: q }, heatTransfer: hv, heatFlux: q };
    }
    case 'evaporation': {
      const m = read('heating.evaporationRate', heating.evaporationRate, 'massFlux');
      const l = positive('heating.latentHeat', read('heating.latentHeat', heating.latentHeat, 'latentHeat'), 1e8, 'latent heat', 'J/kg');
      if (m !== null && !(m >= 0 && m <= 10)) fields['heating.evaporationRate'] = `evaporation rate must be ≥ 0 and ≤ 10 kg/(m²·s); got ${m.toPrecision(4)} kg/(m²·s)`;
      const hv = h(heating.heatTransferCoefficient, false);
      if (m === null || l === null) return { heating: null, heatTransfer: hv, heatFlux: null };
      return { heating: { kind: 'evaporation', evaporationFlux: m, latentHeat: l }, heatTransfer: hv, heatFlux: m * l };
    }
    default: {
      const unknown: never = heating;
      fields.heating = `unknown heating mode ${JSON.stringify(unknown)}`;
      return { heating: null, heatTransfer: null, heatFlux: null };
    }
  }
}
