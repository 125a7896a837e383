import { formatSignificant } from '../../../../shared/units/format-significant';

/**
 * Number formatting for process sheets: 4 significant digits (DESIGN.md), exponents written
 * "× 10^n" because the font subsets have no superscript minus.
 */
export function num(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined) return '—';
  if (!Number.isFinite(value)) return value > 0 ? 'no limit' : '—';
  const text = formatSignificant(value, digits);
  const match = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  if (!match) return text.replace(/^-/, '−');
  const exponent = Number(match[2]);
  return `${match[1].replace(/^-/, '−')} × 10^${exponent}`;
}

/** A length [m] in µm below 1 mm, in mm below 1 m. */
export function length(metres: number | null | undefined): string {
  if (metres === null || metres === undefined || !Number.isFinite(metres)) return '—';
  const abs = Math.abs(metres);
  if (abs < 1e-3) return `${num(metres * 1e6)} µm`;
  if (abs < 1) return `${num(metres * 1e3)} mm`;
  return `${num(metres)} m`;
}

/** A temperature difference [K]. */
export function temperatureDifference(kelvin: number | null | undefined): string {
  if (kelvin === null || kelvin === undefined || !Number.isFinite(kelvin)) return kelvin === null ? 'no limit' : '—';
  return `${num(kelvin)} K`;
}

export function withUnit(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return `${num(value)} ${unit}`;
}

/** ISO 8601 in UTC without milliseconds, e.g. "2026-12-02 03:45:12 UTC". */
export function utc(iso: string | Date): string {
  const date = typeof iso === 'string' ? new Date(iso) : iso;
  return `${date.toISOString().slice(0, 19).replace('T', ' ')} UTC`;
}
