/**
 * The kinds of quantity that QuietLayer reads and writes, with the SI unit each is held in and the
 * units a user may type. The SI unit string is written in the units library's syntax.
 *
 * Absolute temperature and temperature difference are separate kinds on purpose: 68 °F is 293.15 K,
 * but a difference of 9 °F is 5 K with no offset (BIPM 2019, SI Brochure 9th ed. §2.3.1;
 * Thompson & Taylor 2008, NIST SP 811 §B.8 note on temperature intervals).
 */
export type QuantityKind =
  | 'length'
  | 'dynamicViscosity'
  | 'kinematicViscosity'
  | 'surfaceTension'
  | 'temperature'
  | 'temperatureDifference'
  | 'conductivity'
  | 'heatCapacity'
  | 'density'
  | 'heatTransferCoefficient'
  | 'expansion'
  | 'surfaceTensionSlope'
  | 'heatFlux'
  | 'massFlux'
  | 'diffusivity'
  | 'latentHeat'
  | 'speed';

/** What the units layer knows about one quantity kind. */
export interface QuantityKindInfo {
  /** Plain-words name used in error messages. */
  readonly label: string;
  /** SI unit in the units library's syntax. */
  readonly siUnit: string;
  /** SI unit as shown to people. */
  readonly siSymbol: string;
  /** Units a user may type (shown in errors and unit pickers). */
  readonly units: readonly string[];
}

/** Every quantity kind with its SI unit and accepted units (frozen). */
export const quantityKinds: Readonly<Record<QuantityKind, QuantityKindInfo>> = Object.freeze({
  length: { label: 'length', siUnit: 'm', siSymbol: 'm', units: ['m', 'mm', 'µm', 'um', 'mil', 'in'] },
  dynamicViscosity: {
    label: 'dynamic viscosity', siUnit: 'Pa s', siSymbol: 'Pa·s', units: ['Pa·s', 'mPa·s', 'cP', 'P'],
  },
  kinematicViscosity: {
    label: 'kinematic viscosity', siUnit: 'm^2/s', siSymbol: 'm²/s', units: ['m²/s', 'cSt', 'St'],
  },
  surfaceTension: { label: 'surface tension', siUnit: 'N/m', siSymbol: 'N/m', units: ['N/m', 'mN/m', 'dyn/cm'] },
  temperature: {
    label: 'temperature (absolute)', siUnit: 'K', siSymbol: 'K', units: ['K', '°C', 'degC', '°F', 'degF'],
  },
  temperatureDifference: {
    label: 'temperature difference', siUnit: 'K', siSymbol: 'K', units: ['K', '°C', 'degC', '°F', 'degF'],
  },
  conductivity: { label: 'thermal conductivity', siUnit: 'W/(m K)', siSymbol: 'W/(m·K)', units: ['W/(m·K)'] },
  heatCapacity: {
    label: 'specific heat capacity', siUnit: 'J/(kg K)', siSymbol: 'J/(kg·K)', units: ['J/(kg·K)', 'kJ/(kg·K)'],
  },
  density: { label: 'density', siUnit: 'kg/m^3', siSymbol: 'kg/m³', units: ['kg/m³', 'g/cm³'] },
  heatTransferCoefficient: {
    label: 'heat-transfer coefficient',
    siUnit: 'W/(m^2 K)',
    siSymbol: 'W/(m²·K)',
    units: ['W/(m²·K)', 'Btu/(h·ft²·°F)'],
  },
  expansion: { label: 'thermal expansion coefficient', siUnit: 'K^-1', siSymbol: '1/K', units: ['1/K'] },
  surfaceTensionSlope: {
    label: 'surface-tension slope dσ/dT', siUnit: 'N/(m K)', siSymbol: 'N/(m·K)', units: ['N/(m·K)', 'mN/(m·K)'],
  },
  heatFlux: { label: 'heat flux', siUnit: 'W/m^2', siSymbol: 'W/m²', units: ['W/m²', 'kW/m²'] },
  massFlux: {
    label: 'mass flux', siUnit: 'kg/(m^2 s)', siSymbol: 'kg/(m²·s)', units: ['kg/(m²·s)', 'g/(m²·s)'],
  },
  diffusivity: { label: 'diffusivity', siUnit: 'm^2/s', siSymbol: 'm²/s', units: ['m²/s'] },
  latentHeat: { label: 'latent heat', siUnit: 'J/kg', siSymbol: 'J/kg', units: ['J/kg', 'kJ/kg'] },
  speed: { label: 'speed', siUnit: 'm/s', siSymbol: 'm/s', units: ['m/s', 'm/min', 'ft/min'] },
});

/** An absolute (thermodynamic) temperature in kelvin; not interchangeable with a difference. */
export type AbsoluteTemperature = number & { readonly __quantity: 'temperature' };
/** A temperature difference in kelvin (1 °C = 1 K, 1 °F = 5/9 K, no offset). */
export type TemperatureDifference = number & { readonly __quantity: 'temperatureDifference' };

/** The SI value type returned for a quantity kind: temperatures are branded so the two never mix. */
export type SiValue<K extends QuantityKind> = K extends 'temperature'
  ? AbsoluteTemperature
  : K extends 'temperatureDifference'
    ? TemperatureDifference
    : number;
