import { requirePositive } from '../groups/require-positive';
import { requireFinite } from '../groups/require-finite';
import { chiltonColburnMassTransfer } from './chilton-colburn-mass-transfer';
import type { PreparedDryingPath, PreparedZone } from './prepared-drying-path';
import type { DryingPathInput } from './types';

const DEFAULT_FREEZE_VISCOSITY = 1e3;

/**
 * Checks a Drying path input and resolves each zone: its duration (length ÷ line speed, or the
 * scheduled time), start and end times, and its gas-side mass-transfer coefficient (given, or from
 * the heat-transfer coefficient by the Chilton–Colburn analogy).
 *
 * ## Method
 * Residence time t = L/v per zone; k_m = h/(ρ_air c_p,air Le^(2/3)), Le = α_air/D_vapour when a zone
 * gives no k_m. Every physical input is range-checked here, so the integration never starts on
 * impossible values.
 *
 * ## References
 * - Chilton T.H., Colburn A.P. (1934) Ind. Eng. Chem. 26(11):1183–1187. doi:10.1021/ie50299a012
 *
 * @param input - the Drying path input (SI units)
 * @returns the checked input with resolved zones; throws RangeError naming the field and its limit
 * @example prepareDryingPath(demoLine2DryingInput()).zones.map((z) => z.duration) // [8, 12, 12]
 */
export function prepareDryingPath(input: DryingPathInput): PreparedDryingPath {
  const h0 = requirePositive('wetThickness', input.wetThickness, 'm');
  if (h0 > 0.05) throw new RangeError(`wetThickness must be ≤ 0.05 m (a thin film), got ${h0}`);
  const phi0 = requirePositive('solidsFraction', input.solidsFraction, '-');
  if (phi0 >= 1) throw new RangeError(`solidsFraction must be < 1 [-], got ${phi0}`);

  const s = input.solvent;
  requirePositive('solvent.density', s.density, 'kg/m³');
  requirePositive('solvent.latentHeat', s.latentHeat, 'J/kg');
  requirePositive('solvent.molarMass', s.molarMass, 'kg/mol');
  requirePositive('solvent.diffusivity', s.diffusivity, 'm²/s');
  requireFinite('solvent.diffusivitySolidsExponent', s.diffusivitySolidsExponent ?? 0, '-');
  const lfl = requirePositive('solvent.lowerFlammableLimit', s.lowerFlammableLimit, '-');
  if (lfl >= 1) throw new RangeError(`solvent.lowerFlammableLimit must be a volume fraction < 1 (1.1 % → 0.011), got ${lfl}`);
  if (s.volatility.kind === 'antoine') {
    requireFinite('solvent.volatility.a', s.volatility.a, '-');
    requireFinite('solvent.volatility.b', s.volatility.b, 'K');
    requireFinite('solvent.volatility.c', s.volatility.c, 'K');
  } else {
    requirePositive('solvent.volatility.evaporationRate', s.volatility.evaporationRate, 'kg/(m²·s)');
  }

  const f = input.film;
  requirePositive('film.density', f.density, 'kg/m³');
  requirePositive('film.heatCapacity', f.heatCapacity, 'J/(kg·K)');
  requirePositive('film.conductivity', f.conductivity, 'W/(m·K)');
  requireFinite('film.expansion', f.expansion, '1/K');
  requirePositive('film.surfaceTension', f.surfaceTension, 'N/m');
  requireFinite('film.surfaceTensionTemperatureSlope', f.surfaceTensionTemperatureSlope, 'N/(m·K)');
  requireFinite('film.surfaceTensionConcentrationSlope', f.surfaceTensionConcentrationSlope, 'N/m');

  const v = input.viscosity;
  requirePositive('viscosity.solventViscosity', v.solventViscosity, 'Pa·s');
  if (v.kind === 'krieger-dougherty') {
    requirePositive('viscosity.intrinsicViscosity', v.intrinsicViscosity, '-');
    const phiM = requirePositive('viscosity.maxPackingFraction', v.maxPackingFraction, '-');
    if (phiM > 1) throw new RangeError(`viscosity.maxPackingFraction must be ≤ 1 [-], got ${phiM}`);
    if (phi0 >= phiM) throw new RangeError(`solidsFraction must be below viscosity.maxPackingFraction (${phiM}), got ${phi0}`);
  } else {
    requireFinite('viscosity.exponent', v.exponent, '-');
  }
  if ((v.activationTemperature ?? 0) !== 0) {
    requireFinite('viscosity.activationTemperature', v.activationTemperature ?? 0, 'K');
    requirePositive('viscosity.referenceTemperature', v.referenceTemperature ?? Number.NaN, 'K');
  }

  const sub = input.substrate;
  if (sub.kind === 'held') requirePositive('substrate.temperature', sub.temperature, 'K');
  else {
    requirePositive('substrate.arealHeatCapacity', sub.arealHeatCapacity, 'J/(m²·K)', { allowZero: true });
    requirePositive('substrate.initialTemperature', sub.initialTemperature, 'K');
  }

  const transport = input.oven.transport;
  const lineSpeed = transport.kind === 'line' ? requirePositive('oven.transport.lineSpeed', transport.lineSpeed, 'm/s') : null;
  const webWidth =
    transport.kind === 'line' && transport.webWidth !== undefined ? requirePositive('oven.transport.webWidth', transport.webWidth, 'm') : null;
  if (input.oven.zones.length === 0) throw new RangeError('oven.zones must hold at least one zone');
  if (input.oven.zones.length > 50) throw new RangeError(`oven.zones must hold at most 50 zones, got ${input.oven.zones.length}`);

  let clock = 0;
  const zones: PreparedZone[] = input.oven.zones.map((z, index) => {
    const field = `oven.zones[${index}]`;
    let duration: number;
    let length = Number.NaN;
    if (lineSpeed !== null) {
      length = requirePositive(`${field}.length`, z.length ?? Number.NaN, 'm');
      duration = length / lineSpeed;
    } else {
      duration = requirePositive(`${field}.duration`, z.duration ?? Number.NaN, 's');
    }
    const airTemperature = requirePositive(`${field}.airTemperature`, z.airTemperature, 'K');
    const heatTransferTop = requirePositive(`${field}.heatTransferCoefficient`, z.heatTransferCoefficient, 'W/(m²·K)', { allowZero: true });
    const heatTransferBack = requirePositive(`${field}.backHeatTransferCoefficient`, z.backHeatTransferCoefficient ?? 0, 'W/(m²·K)', {
      allowZero: true,
    });
    const cInf = requirePositive(`${field}.ambientVapourConcentration`, z.ambientVapourConcentration ?? 0, 'kg/m³', { allowZero: true });
    let km = Number.NaN;
    if (s.volatility.kind === 'antoine') {
      if (z.massTransferCoefficient !== undefined) {
        km = requirePositive(`${field}.massTransferCoefficient`, z.massTransferCoefficient, 'm/s', { allowZero: true });
      } else {
        if (!input.air) throw new RangeError(`air properties are required when ${field}.massTransferCoefficient is not given (Chilton–Colburn analogy)`);
        if (s.vapourDiffusivityInAir === undefined) {
          throw new RangeError(`solvent.vapourDiffusivityInAir is required when ${field}.massTransferCoefficient is not given`);
        }
        km = chiltonColburnMassTransfer({
          heatTransferCoefficient: heatTransferTop,
          airDensity: input.air.density,
          airHeatCapacity: input.air.heatCapacity,
          airThermalDiffusivity: input.air.thermalDiffusivity,
          vapourDiffusivity: s.vapourDiffusivityInAir,
        });
      }
    }
    const zone: PreparedZone = {
      index,
      name: z.name ?? `Zone ${index + 1}`,
      startTime: clock,
      endTime: clock + duration,
      duration,
      length,
      airTemperature,
      heatTransferTop,
      heatTransferBack,
      massTransferCoefficient: km,
      ambientBackFlux: Number.isNaN(km) ? 0 : km * cInf,
    };
    clock += duration;
    return zone;
  });

  const freezeViscosity = requirePositive('freezeViscosity', input.freezeViscosity ?? DEFAULT_FREEZE_VISCOSITY, 'Pa·s');
  let freezeSolidsFraction: number | null = v.kind === 'krieger-dougherty' ? v.maxPackingFraction : null;
  if (input.freezeSolidsFraction !== undefined) {
    freezeSolidsFraction = requirePositive('freezeSolidsFraction', input.freezeSolidsFraction, '-');
    if (freezeSolidsFraction > 1) throw new RangeError(`freezeSolidsFraction must be ≤ 1 [-], got ${freezeSolidsFraction}`);
  }
  const gridPoints = input.gridPoints ?? 121;
  if (!Number.isInteger(gridPoints) || gridPoints < 2 || gridPoints > 5000) {
    throw new RangeError(`gridPoints must be an integer in [2, 5000], got ${gridPoints}`);
  }
  const rtol = input.rtol ?? 1e-8;
  if (!(rtol >= 1e-12 && rtol <= 1e-3)) throw new RangeError(`rtol must be in [1e-12, 1e-3], got ${rtol}`);

  return {
    input,
    zones,
    totalTime: clock,
    lineSpeed,
    webWidth,
    freezeViscosity,
    freezeSolidsFraction,
    solidsThickness: h0 * phi0,
    gridPoints,
    rtol,
  };
}
