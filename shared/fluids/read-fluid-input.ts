import type { FluidInputParsed, Property, ViscosityLaw } from '../schemas/fluids';
import { parseQuantity } from '../units/parse-quantity';
import { quantityKinds, type QuantityKind } from '../units/quantity-kinds';
import { UnitError } from '../units/unit-error';
import { fitAndradeViscosity } from './fit-andrade-viscosity';
import type { FluidLaws } from './fluid-laws';

/** A fluid input read into SI: the stored parts (text as entered + SI) and the laws. */
export interface ReadFluid {
  readonly name: string;
  readonly kind: FluidInputParsed['kind'];
  readonly notes: string;
  readonly referenceTemperature: { value: string; si: number };
  readonly validFrom: { value: string; si: number } | null;
  readonly validTo: { value: string; si: number } | null;
  readonly density: Property;
  readonly expansion: Property;
  readonly viscosity: ViscosityLaw;
  readonly surfaceTension: Property;
  readonly surfaceTensionSlope: Property;
  readonly conductivity: Property;
  readonly heatCapacity: Property | null;
  readonly thermalDiffusivity: Property | null;
  readonly soluteDiffusivity: Property | null;
  readonly soluteSurfaceTensionSlope: Property | null;
  readonly laws: FluidLaws;
}

export type ReadFluidResult = { ok: true; fluid: ReadFluid } | { ok: false; fields: Record<string, string> };

interface Limit {
  min: number;
  max: number;
  /** true: min is exclusive (> min) */
  exclusiveMin?: boolean;
  text: string;
}

/**
 * Plausibility ranges of liquid properties [SI]. Wide on purpose: they catch unit slips
 * (a viscosity typed in Pa·s instead of mPa·s, a surface tension in N/m for a solvent),
 * not unusual fluids. The surface-tension ceiling for non-metals follows from the highest
 * ordinary liquid, water at ≈ 0.073 N/m (IAPWS R1-76); liquid metals reach ≈ 1.9 N/m
 * (Sahoo, DebRoy & McNallan 1988, pure iron γ_m° = 1.943 N/m).
 */
const LIMITS = {
  density: { min: 0, max: 25_000, exclusiveMin: true, text: 'density must be > 0 and ≤ 25 000 kg/m³' },
  expansion: { min: -0.01, max: 0.01, text: 'expansion coefficient must lie between −0.01 and 0.01 1/K' },
  viscosity: { min: 0, max: 1e6, exclusiveMin: true, text: 'viscosity must be > 0 and ≤ 10⁶ Pa·s' },
  activationTemperature: { min: -1e5, max: 1e5, text: 'activation temperature B must lie between −100 000 K and 100 000 K' },
  surfaceTension: { min: 0, max: 1, exclusiveMin: true, text: 'surface tension must be > 0 and ≤ 1 N/m (above 1 N/m only for kind molten-metal)' },
  surfaceTensionMetal: { min: 0, max: 3, exclusiveMin: true, text: 'surface tension must be > 0 and ≤ 3 N/m' },
  surfaceTensionSlope: { min: -0.01, max: 0.01, text: 'dσ/dT must lie between −10 and 10 mN/(m·K)' },
  conductivity: { min: 0, max: 500, exclusiveMin: true, text: 'thermal conductivity must be > 0 and ≤ 500 W/(m·K)' },
  heatCapacity: { min: 0, max: 100_000, exclusiveMin: true, text: 'heat capacity must be > 0 and ≤ 100 000 J/(kg·K)' },
  thermalDiffusivity: { min: 0, max: 1e-3, exclusiveMin: true, text: 'thermal diffusivity must be > 0 and ≤ 10⁻³ m²/s' },
  soluteDiffusivity: { min: 0, max: 1e-6, exclusiveMin: true, text: 'solute diffusivity must be > 0 and ≤ 10⁻⁶ m²/s' },
  soluteSurfaceTensionSlope: { min: -1, max: 1, text: 'dσ/dc must lie between −1 and 1 N/m per unit mass fraction' },
} satisfies Record<string, Limit>;

function withinLimit(value: number, limit: Limit): boolean {
  if (limit.exclusiveMin ? !(value > limit.min) : !(value >= limit.min)) return false;
  return value <= limit.max;
}

/**
 * Read a fluid as typed (text with units) into SI, check every value against plausible ranges,
 * fit the viscosity law, and report every problem keyed by the dotted input path.
 *
 * ## Method
 * Each quantity is read with `parseQuantity` for its kind. A viscosity point typed as a kinematic
 * viscosity (cSt, St, m²/s) becomes dynamic with the density at that point's temperature,
 * μ = ν·ρ(T) (ASTM D445 defines cSt as μ/ρ). Two or more points are fitted to μ = A·exp(B/T)
 * ({@link fitAndradeViscosity}).
 *
 * ## References
 * - Thompson A., Taylor B.N. (2008) NIST SP 811, Appendix B (unit conversions).
 * - Andrade E.N. da C. (1930) The viscosity of liquids. Nature 125:309–310.
 *
 * @param input - the parsed (zod-validated) fluid input
 * @returns the fluid in SI with its laws, or the field errors
 * @example readFluidInput(waterInput).ok // true
 */
export function readFluidInput(input: FluidInputParsed): ReadFluidResult {
  const fields: Record<string, string> = {};
  const quantity = (path: string, text: string, kind: QuantityKind): number | null => {
    try {
      return parseQuantity(text, kind);
    } catch (error) {
      fields[path] = error instanceof UnitError || error instanceof Error ? error.message : String(error);
      return null;
    }
  };
  const check = (path: string, value: number | null, limit: Limit): number | null => {
    if (value === null) return null;
    if (!withinLimit(value, limit)) {
      fields[path] = `${limit.text}; got ${value.toPrecision(4)} ${siSymbolOf(limit)}`;
      return null;
    }
    return value;
  };
  const property = (path: string, entered: FluidInputParsed['density'], kind: QuantityKind, limit: Limit): Property | null => {
    const si = check(`${path}.value`, quantity(`${path}.value`, entered.value, kind), limit);
    if (si === null) return null;
    return {
      value: entered.value,
      source: entered.source,
      uncertaintyPercent: entered.uncertaintyPercent,
      distribution: entered.distribution,
      si,
      siUnit: quantityKinds[kind].siSymbol,
    };
  };
  const optionalProperty = (path: string, entered: FluidInputParsed['heatCapacity'], kind: QuantityKind, limit: Limit) =>
    entered === undefined ? null : property(path, entered, kind, limit);

  const referenceTemperatureSi = quantity('referenceTemperature', input.referenceTemperature, 'temperature');
  const validFromSi = input.validFrom === undefined ? null : quantity('validFrom', input.validFrom, 'temperature');
  const validToSi = input.validTo === undefined ? null : quantity('validTo', input.validTo, 'temperature');
  if ((input.validFrom === undefined) !== (input.validTo === undefined)) {
    fields[input.validFrom === undefined ? 'validFrom' : 'validTo'] = 'give both ends of the valid temperature range, or neither';
  } else if (validFromSi !== null && validToSi !== null && !(validFromSi < validToSi)) {
    fields.validTo = 'validTo must be above validFrom';
  }

  const density = property('density', input.density, 'density', LIMITS.density);
  const expansion = property('expansion', input.expansion, 'expansion', LIMITS.expansion);
  const surfaceTension = property(
    'surfaceTension',
    input.surfaceTension,
    'surfaceTension',
    input.kind === 'molten-metal' ? LIMITS.surfaceTensionMetal : LIMITS.surfaceTension,
  );
  const surfaceTensionSlope = property('surfaceTensionSlope', input.surfaceTensionSlope, 'surfaceTensionSlope', LIMITS.surfaceTensionSlope);
  const conductivity = property('conductivity', input.conductivity, 'conductivity', LIMITS.conductivity);
  const heatCapacity = optionalProperty('heatCapacity', input.heatCapacity, 'heatCapacity', LIMITS.heatCapacity);
  const thermalDiffusivity = optionalProperty('thermalDiffusivity', input.thermalDiffusivity, 'diffusivity', LIMITS.thermalDiffusivity);
  if (input.heatCapacity === undefined && input.thermalDiffusivity === undefined) {
    fields.heatCapacity = 'give a heat capacity or a thermal diffusivity';
  }
  const soluteDiffusivity = optionalProperty('soluteDiffusivity', input.soluteDiffusivity, 'diffusivity', LIMITS.soluteDiffusivity);
  const soluteSurfaceTensionSlope = optionalProperty(
    'soluteSurfaceTensionSlope',
    input.soluteSurfaceTensionSlope,
    'surfaceTension',
    LIMITS.soluteSurfaceTensionSlope,
  );

  const viscosity = readViscosityLaw(input, density?.si ?? null, expansion?.si ?? null, referenceTemperatureSi, quantity, check, fields);

  if (Object.keys(fields).length > 0 || referenceTemperatureSi === null || !density || !expansion || !viscosity ||
    !surfaceTension || !surfaceTensionSlope || !conductivity) {
    if (Object.keys(fields).length === 0) fields[''] = 'the fluid could not be read';
    return { ok: false, fields };
  }
  const laws: FluidLaws = Object.freeze({
    kind: input.kind,
    referenceTemperature: referenceTemperatureSi,
    validFrom: validFromSi,
    validTo: validToSi,
    density: density.si,
    expansion: expansion.si,
    viscosityPreExponential: viscosity.fitPreExponential,
    viscosityActivationTemperature: viscosity.fitActivationTemperature,
    surfaceTension: surfaceTension.si,
    surfaceTensionSlope: surfaceTensionSlope.si,
    conductivity: conductivity.si,
    heatCapacity: heatCapacity?.si ?? null,
    thermalDiffusivity: heatCapacity ? null : (thermalDiffusivity?.si ?? null),
    soluteDiffusivity: soluteDiffusivity?.si ?? null,
    soluteSurfaceTensionSlope: soluteSurfaceTensionSlope?.si ?? null,
  });
  return {
    ok: true,
    fluid: {
      name: input.name,
      kind: input.kind,
      notes: input.notes,
      referenceTemperature: { value: input.referenceTemperature, si: referenceTemperatureSi },
      validFrom: input.validFrom !== undefined && validFromSi !== null ? { value: input.validFrom, si: validFromSi } : null,
      validTo: input.validTo !== undefined && validToSi !== null ? { value: input.validTo, si: validToSi } : null,
      density,
      expansion,
      viscosity,
      surfaceTension,
      surfaceTensionSlope,
      conductivity,
      heatCapacity,
      thermalDiffusivity,
      soluteDiffusivity,
      soluteSurfaceTensionSlope,
      laws,
    },
  };
}

function siSymbolOf(limit: Limit): string {
  const match = /(kg\/m³|1\/K|Pa·s|N\/m|mN\/\(m·K\)|W\/\(m·K\)|J\/\(kg·K\)|m²\/s| K)/.exec(limit.text);
  if (!match) return '(SI)';
  if (match[1] === 'mN/(m·K)') return 'N/(m·K)';
  return match[1].trim();
}

function readViscosityLaw(
  input: FluidInputParsed,
  referenceDensity: number | null,
  expansion: number | null,
  referenceTemperature: number | null,
  quantity: (path: string, text: string, kind: QuantityKind) => number | null,
  check: (path: string, value: number | null, limit: Limit) => number | null,
  fields: Record<string, string>,
): ViscosityLaw | null {
  const law = input.viscosity;
  const common = { source: law.source, uncertaintyPercent: law.uncertaintyPercent, distribution: law.distribution };
  if (law.law === 'andrade') {
    const a = check('viscosity.preExponential', quantity('viscosity.preExponential', law.preExponential, 'dynamicViscosity'), LIMITS.viscosity);
    const b = check(
      'viscosity.activationTemperature',
      quantity('viscosity.activationTemperature', law.activationTemperature, 'temperatureDifference'),
      LIMITS.activationTemperature,
    );
    if (a === null || b === null) return null;
    return {
      law: 'andrade',
      preExponential: law.preExponential,
      activationTemperature: law.activationTemperature,
      ...common,
      fitPreExponential: a,
      fitActivationTemperature: b,
      fitRmsRelativeError: 0,
    };
  }
  const points: { temperature: number; viscosity: number }[] = [];
  law.points.forEach((point, index) => {
    const path = `viscosity.points.${index}`;
    const temperature = quantity(`${path}.temperature`, point.temperature, 'temperature');
    let viscosity: number | null = null;
    try {
      viscosity = parseQuantity(point.value, 'dynamicViscosity');
    } catch (dynamicError) {
      try {
        const nu = parseQuantity(point.value, 'kinematicViscosity');
        if (referenceDensity === null || expansion === null || referenceTemperature === null || temperature === null) {
          fields[`${path}.value`] = 'a kinematic viscosity needs a valid density, expansion and reference temperature to convert';
        } else {
          viscosity = nu * referenceDensity * (1 - expansion * (temperature - referenceTemperature));
        }
      } catch {
        fields[`${path}.value`] = `${(dynamicError as Error).message} (or a kinematic viscosity such as cSt)`;
      }
    }
    viscosity = check(`${path}.value`, viscosity, LIMITS.viscosity);
    if (temperature !== null && viscosity !== null) points.push({ temperature, viscosity });
  });
  if (points.length !== law.points.length) return null;
  try {
    const fit = fitAndradeViscosity(points);
    return {
      law: 'points',
      points: law.points.map((p) => ({ temperature: p.temperature, value: p.value })),
      ...common,
      fitPreExponential: fit.preExponential,
      fitActivationTemperature: fit.activationTemperature,
      fitRmsRelativeError: fit.rmsRelativeError,
    };
  } catch (error) {
    fields['viscosity.points'] = (error as Error).message;
    return null;
  }
}
