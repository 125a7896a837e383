import { useSyncExternalStore } from 'react';
import { formatQuantity } from '../../shared/units/format-quantity';
import type { QuantityKind } from '../../shared/units/quantity-kinds';

/**
 * The units a person reads numbers in, kept per person in this browser (localStorage).
 * The server always answers in SI; this only changes how numbers are shown.
 */
export const unitSystemValues = ['si', 'floor', 'us'] as const;
export type UnitSystem = (typeof unitSystemValues)[number];

export const unitSystemLabels: Readonly<Record<UnitSystem, string>> = Object.freeze({
  si: 'SI (m, Pa·s, N/m, K)',
  floor: 'Coating floor (µm, mPa·s, mN/m, °C)',
  us: 'US (mil, cP, dyn/cm, °F)',
});

/** The display unit of each quantity kind in each system (units-library spelling accepted by fromSi). */
export const displayUnits: Readonly<Record<UnitSystem, Readonly<Record<QuantityKind, string>>>> = Object.freeze({
  si: {
    length: 'm',
    dynamicViscosity: 'Pa·s',
    kinematicViscosity: 'm²/s',
    surfaceTension: 'N/m',
    temperature: 'K',
    temperatureDifference: 'K',
    conductivity: 'W/(m·K)',
    heatCapacity: 'J/(kg·K)',
    density: 'kg/m³',
    heatTransferCoefficient: 'W/(m²·K)',
    expansion: '1/K',
    surfaceTensionSlope: 'N/(m·K)',
    heatFlux: 'W/m²',
    massFlux: 'kg/(m²·s)',
    diffusivity: 'm²/s',
    latentHeat: 'J/kg',
    speed: 'm/s',
  },
  floor: {
    length: 'µm',
    dynamicViscosity: 'mPa·s',
    kinematicViscosity: 'cSt',
    surfaceTension: 'mN/m',
    temperature: '°C',
    temperatureDifference: 'K',
    conductivity: 'W/(m·K)',
    heatCapacity: 'kJ/(kg·K)',
    density: 'kg/m³',
    heatTransferCoefficient: 'W/(m²·K)',
    expansion: '1/K',
    surfaceTensionSlope: 'mN/(m·K)',
    heatFlux: 'W/m²',
    massFlux: 'g/(m²·s)',
    diffusivity: 'm²/s',
    latentHeat: 'kJ/kg',
    speed: 'mm/s',
  },
  us: {
    length: 'mil',
    dynamicViscosity: 'cP',
    kinematicViscosity: 'cSt',
    surfaceTension: 'dyn/cm',
    temperature: '°F',
    temperatureDifference: '°F',
    conductivity: 'W/(m·K)',
    heatCapacity: 'kJ/(kg·K)',
    density: 'kg/m³',
    heatTransferCoefficient: 'Btu/(h·ft²·°F)',
    expansion: '1/K',
    surfaceTensionSlope: 'dyn/(cm·K)',
    heatFlux: 'W/m²',
    massFlux: 'g/(m²·s)',
    diffusivity: 'm²/s',
    latentHeat: 'kJ/kg',
    speed: 'ft/min',
  },
});

const STORAGE_KEY = 'quietlayer.unitSystem';
const listeners = new Set<() => void>();

function isUnitSystem(value: unknown): value is UnitSystem {
  return typeof value === 'string' && (unitSystemValues as readonly string[]).includes(value);
}

/** The stored choice; coating-floor units when nothing (or something unreadable) is stored. */
export function readUnitSystem(): UnitSystem {
  try {
    const stored = globalThis.localStorage?.getItem(STORAGE_KEY);
    return isUnitSystem(stored) ? stored : 'floor';
  } catch {
    return 'floor';
  }
}

export function writeUnitSystem(system: UnitSystem): void {
  try {
    globalThis.localStorage?.setItem(STORAGE_KEY, system);
  } catch {
    // Private windows may refuse storage; the choice then lasts for this page only.
  }
  current = system;
  for (const listener of listeners) listener();
}

let current: UnitSystem | undefined;

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === STORAGE_KEY) {
      current = readUnitSystem();
      listener();
    }
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

function snapshot(): UnitSystem {
  current ??= readUnitSystem();
  return current;
}

/** The person's unit system and a setter; every component using it re-renders on a change (and across tabs). */
export function useUnitSystem(): [UnitSystem, (system: UnitSystem) => void] {
  const system = useSyncExternalStore(subscribe, snapshot, () => 'floor' as const);
  return [system, writeUnitSystem];
}

/**
 * An SI value in the unit system's unit for its kind, 4 significant digits; "—" for null
 * (the physics says "no limit" or "not applicable") and for values that cannot be shown.
 */
export function formatInSystem(si: number | null | undefined, kind: QuantityKind, system: UnitSystem, significantDigits = 4): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  try {
    return withPowerOfTen(formatQuantity(si, kind, displayUnits[system][kind], significantDigits));
  } catch {
    return '—';
  }
}

/**
 * A length in the system's family but with a unit that suits its size (a scale bar of 10 mm, not
 * 10 000 µm): µm → mm → m on the coating floor, mil → in in US units, m in SI.
 */
export function formatLengthForScale(si: number, system: UnitSystem, significantDigits = 3): string {
  if (!Number.isFinite(si)) return '—';
  const unit = system === 'si' ? 'm' : system === 'us' ? (si < 0.0254 ? 'mil' : 'in') : si < 1e-3 ? 'µm' : si < 1 ? 'mm' : 'm';
  try {
    return withPowerOfTen(formatQuantity(si, 'length', unit, significantDigits));
  } catch {
    return '—';
  }
}

/** A dimensionless number with 4 significant digits (thin space before a power of ten). */
export function formatNumber(value: number | null | undefined, significantDigits = 4): string {
  if (value === null || value === undefined) return '—';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  if (exponent < -3 || exponent >= 6) {
    const [mantissa, power] = value.toExponential(significantDigits - 1).split('e');
    return `${mantissa} × 10${toSuperscript(Number(power))}`;
  }
  return Number(value.toPrecision(significantDigits)).toLocaleString('en-GB', { maximumSignificantDigits: significantDigits, useGrouping: exponent >= 4 });
}

/** "1.000e-9 m²/s" → "1.000 × 10⁻⁹ m²/s": powers of ten as people write them. */
export function withPowerOfTen(text: string): string {
  return text.replace(/(\d)e([+-]?\d+)/, (_match, digit: string, power: string) => `${digit} × 10${toSuperscript(Number(power))}`);
}

const superscripts: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

function toSuperscript(power: number): string {
  return String(power)
    .split('')
    .map((char) => superscripts[char] ?? char)
    .join('');
}
