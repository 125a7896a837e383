import type { DryingPathInputBody } from '../../../../shared/schemas/drying-paths';

/** One oven zone as typed in the zones table. */
export interface ZoneValues {
  name: string;
  length: string;
  duration: string;
  airTemperature: string;
  heatTransferCoefficient: string;
  backHeatTransferCoefficient: string;
}

/** Everything the Drying path form holds, as typed (quantities with units). */
export interface DryingFormValues {
  wetThickness: string;
  solidsFraction: string;
  transport: 'line' | 'schedule';
  lineSpeed: string;
  webWidth: string;
  zones: ZoneValues[];
  solventName: string;
  solventDensity: string;
  latentHeat: string;
  molarMass: string;
  volatility: 'antoine' | 'fixed-rate';
  antoineA: string;
  antoineB: string;
  antoineC: string;
  evaporationRate: string;
  diffusivity: string;
  diffusivitySolidsExponent: string;
  vapourDiffusivityInAir: string;
  lowerFlammableLimit: string;
  viscosityKind: 'exponential' | 'krieger-dougherty';
  solventViscosity: string;
  viscosityExponent: string;
  intrinsicViscosity: string;
  maxPackingFraction: string;
  filmDensity: string;
  filmHeatCapacity: string;
  filmConductivity: string;
  filmExpansion: string;
  filmSurfaceTension: string;
  filmSurfaceTensionSlope: string;
  filmConcentrationSlope: string;
  substrateKind: 'thermal-mass' | 'held';
  arealHeatCapacity: string;
  substrateTemperature: string;
  airDensity: string;
  airHeatCapacity: string;
  airThermalDiffusivity: string;
  continuousSolventMonitoring: boolean;
}

/**
 * The Larkspur Coatings Line 2 demo (INVENTED line and primer; solvent values are toluene's handbook
 * values, see shared/physics/drying/demo-line-2.ts for the sources), as a person would type it.
 */
export function line2FormValues(): DryingFormValues {
  return {
    wetThickness: '40 µm',
    solidsFraction: '35 %',
    transport: 'line',
    lineSpeed: '30 m/min',
    webWidth: '1.2 m',
    zones: [
      { name: 'Zone 1', length: '4 m', duration: '8', airTemperature: '60 °C', heatTransferCoefficient: '40 W/(m²·K)', backHeatTransferCoefficient: '40 W/(m²·K)' },
      { name: 'Zone 2', length: '6 m', duration: '12', airTemperature: '90 °C', heatTransferCoefficient: '60 W/(m²·K)', backHeatTransferCoefficient: '60 W/(m²·K)' },
      { name: 'Zone 3', length: '6 m', duration: '12', airTemperature: '120 °C', heatTransferCoefficient: '80 W/(m²·K)', backHeatTransferCoefficient: '80 W/(m²·K)' },
    ],
    solventName: 'PR-2 thinner (toluene values)',
    solventDensity: '866.9 kg/m³',
    latentHeat: '412.4 kJ/kg',
    molarMass: '92.141 g/mol',
    volatility: 'antoine',
    antoineA: '4.07827',
    antoineB: '1343.943',
    antoineC: '-53.773',
    evaporationRate: '0.5 g/(m²·s)',
    diffusivity: '1e-9 m²/s',
    diffusivitySolidsExponent: '4',
    vapourDiffusivityInAir: '8.6e-6 m²/s',
    lowerFlammableLimit: '1.1 %',
    viscosityKind: 'exponential',
    solventViscosity: '0.56 mPa·s',
    viscosityExponent: '18',
    intrinsicViscosity: '2.5',
    maxPackingFraction: '64 %',
    filmDensity: '1100 kg/m³',
    filmHeatCapacity: '1800 J/(kg·K)',
    filmConductivity: '0.16 W/(m·K)',
    filmExpansion: '1e-3 1/K',
    filmSurfaceTension: '30 mN/m',
    filmSurfaceTensionSlope: '-0.1 mN/(m·K)',
    filmConcentrationSlope: '-12 mN/m',
    substrateKind: 'thermal-mass',
    arealHeatCapacity: '81.3',
    substrateTemperature: '25 °C',
    airDensity: '0.995 kg/m³',
    airHeatCapacity: '1009 J/(kg·K)',
    airThermalDiffusivity: '29.9e-6 m²/s',
    continuousSolventMonitoring: false,
  };
}

/** A number typed in a plain-number box; text that is not a number is sent as is so the server names the field. */
const num = (text: string): number | string => {
  const trimmed = text.trim();
  return trimmed !== '' && Number.isFinite(Number(trimmed)) ? Number(trimmed) : trimmed;
};
const optional = (text: string): string | undefined => (text.trim() === '' ? undefined : text.trim());

/** The API body for the form values (shared/schemas/drying-paths.ts). */
export function valuesToDryingInput(v: DryingFormValues): DryingPathInputBody {
  const line = v.transport === 'line';
  return {
    wetThickness: v.wetThickness,
    solidsFraction: v.solidsFraction,
    solvent: {
      name: v.solventName,
      density: v.solventDensity,
      latentHeat: v.latentHeat,
      molarMass: v.molarMass,
      volatility:
        v.volatility === 'antoine'
          ? { kind: 'antoine', a: num(v.antoineA) as number, b: num(v.antoineB) as number, c: num(v.antoineC) as number }
          : { kind: 'fixed-rate', evaporationRate: v.evaporationRate },
      diffusivity: v.diffusivity,
      diffusivitySolidsExponent: optional(v.diffusivitySolidsExponent) === undefined ? undefined : (num(v.diffusivitySolidsExponent) as number),
      vapourDiffusivityInAir: optional(v.vapourDiffusivityInAir),
      lowerFlammableLimit: v.lowerFlammableLimit,
    },
    film: {
      density: v.filmDensity,
      heatCapacity: v.filmHeatCapacity,
      conductivity: v.filmConductivity,
      expansion: v.filmExpansion,
      surfaceTension: v.filmSurfaceTension,
      surfaceTensionTemperatureSlope: v.filmSurfaceTensionSlope,
      surfaceTensionConcentrationSlope: v.filmConcentrationSlope,
    },
    viscosity:
      v.viscosityKind === 'exponential'
        ? { kind: 'exponential', solventViscosity: v.solventViscosity, exponent: num(v.viscosityExponent) as number }
        : { kind: 'krieger-dougherty', solventViscosity: v.solventViscosity, intrinsicViscosity: num(v.intrinsicViscosity) as number, maxPackingFraction: v.maxPackingFraction },
    oven: {
      transport: line ? { kind: 'line', lineSpeed: v.lineSpeed, webWidth: optional(v.webWidth) } : { kind: 'schedule' },
      zones: v.zones.map((z) => ({
        name: optional(z.name),
        ...(line ? { length: z.length } : { duration: num(z.duration) as number }),
        airTemperature: z.airTemperature,
        heatTransferCoefficient: z.heatTransferCoefficient,
        backHeatTransferCoefficient: optional(z.backHeatTransferCoefficient),
      })),
    },
    substrate:
      v.substrateKind === 'thermal-mass'
        ? { kind: 'thermal-mass', arealHeatCapacity: num(v.arealHeatCapacity) as number, initialTemperature: v.substrateTemperature }
        : { kind: 'held', temperature: v.substrateTemperature },
    air: { density: v.airDensity, heatCapacity: v.airHeatCapacity, thermalDiffusivity: v.airThermalDiffusivity },
    continuousSolventMonitoring: v.continuousSolventMonitoring,
  };
}

/** API field path of each form field (for placing server errors beside their field). */
export const apiPathOf: Record<string, string> = {
  wetThickness: 'wetThickness',
  solidsFraction: 'solidsFraction',
  lineSpeed: 'oven.transport.lineSpeed',
  webWidth: 'oven.transport.webWidth',
  solventName: 'solvent.name',
  solventDensity: 'solvent.density',
  latentHeat: 'solvent.latentHeat',
  molarMass: 'solvent.molarMass',
  antoineA: 'solvent.volatility.a',
  antoineB: 'solvent.volatility.b',
  antoineC: 'solvent.volatility.c',
  evaporationRate: 'solvent.volatility.evaporationRate',
  diffusivity: 'solvent.diffusivity',
  diffusivitySolidsExponent: 'solvent.diffusivitySolidsExponent',
  vapourDiffusivityInAir: 'solvent.vapourDiffusivityInAir',
  lowerFlammableLimit: 'solvent.lowerFlammableLimit',
  solventViscosity: 'viscosity.solventViscosity',
  viscosityExponent: 'viscosity.exponent',
  intrinsicViscosity: 'viscosity.intrinsicViscosity',
  maxPackingFraction: 'viscosity.maxPackingFraction',
  filmDensity: 'film.density',
  filmHeatCapacity: 'film.heatCapacity',
  filmConductivity: 'film.conductivity',
  filmExpansion: 'film.expansion',
  filmSurfaceTension: 'film.surfaceTension',
  filmSurfaceTensionSlope: 'film.surfaceTensionTemperatureSlope',
  filmConcentrationSlope: 'film.surfaceTensionConcentrationSlope',
  arealHeatCapacity: 'substrate.arealHeatCapacity',
  substrateTemperature: 'substrate.initialTemperature',
  airDensity: 'air.density',
  airHeatCapacity: 'air.heatCapacity',
  airThermalDiffusivity: 'air.thermalDiffusivity',
};
