import { formatInSystem, formatNumber, type UnitSystem } from '../../../lib/unit-system';

/** Film thickness in the person's unit system (µm on the floor, mil in US units). */
export const formatThickness = (si: number | null | undefined, system: UnitSystem) => formatInSystem(si, 'length', system === 'si' ? 'floor' : system, 4);
export const formatTemperature = (si: number | null | undefined, system: UnitSystem) => formatInSystem(si, 'temperature', system, 4);
export const formatMargin = (margin: number | null) => (margin === null ? 'no onset' : `${formatNumber(margin, 3)}×`);
/** Thickness unit label used on chart axes. */
export const thicknessAxis = (system: UnitSystem) => (system === 'us' ? { unit: 'mil', factor: 1 / 25.4e-6 } : { unit: 'µm', factor: 1e6 });
