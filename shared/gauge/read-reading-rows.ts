import type { QuantityKind } from '../units/quantity-kinds';
import { resolveUnit } from '../units/resolve-unit';
import { toSi } from '../units/to-si';
import { wetThicknessFromDry } from './wet-dry';

/** The reading fields a CSV column can be mapped to. */
export const readingColumnFields = ['run', 'position', 'time', 'direction', 'thickness', 'substrateTemperature', 'airTemperature', 'operator'] as const;
export type ReadingColumnField = (typeof readingColumnFields)[number];

/** Fields that carry a unit, and the kind of quantity it must measure. */
export const readingUnitKinds = {
  thickness: 'length',
  position: 'length',
  substrateTemperature: 'temperature',
  airTemperature: 'temperature',
} as const satisfies Partial<Record<ReadingColumnField, QuantityKind>>;
export type ReadingUnitField = keyof typeof readingUnitKinds;

/** Which header feeds each field (header text as in the file), and units chosen by the person. */
export interface ReadingColumnMapping {
  readonly columns: Partial<Record<ReadingColumnField, string>>;
  readonly units: Partial<Record<ReadingUnitField, string>>;
}

/** How the thickness column was measured; dry readings are converted to wet through volume solids. */
export type ThicknessBasis =
  | { readonly kind: 'wet' }
  | { readonly kind: 'dry'; /** 0 < VS ≤ 1 */ readonly volumeSolids: number; /** volumes per volume, ≥ 0 */ readonly thinner: number };

/** One reading read from a row, SI inside. */
export interface ReadReading {
  /** Line in the file (header = line 1). */
  readonly line: number;
  readonly run: string;
  /** Position along the web [m], or null. */
  readonly position: number | null;
  /** Time of the reading [ms since 1970-01-01 UTC], or null. */
  readonly measuredAt: number | null;
  readonly direction: 'md' | 'cd' | null;
  /** The number as entered and its unit. */
  readonly enteredThickness: number;
  readonly enteredUnit: string;
  /** Wet film thickness [m] (converted from dry when the basis is dry). */
  readonly wetThickness: number;
  /** [K] or null */
  readonly substrateTemperature: number | null;
  readonly airTemperature: number | null;
  readonly operator: string | null;
}

export interface RowError {
  /** Line in the file (header = line 1). */
  readonly line: number;
  /** Header of the column, or null for a whole-row problem. */
  readonly column: string | null;
  readonly message: string;
}

export interface ReadRowsResult {
  readonly readings: ReadReading[];
  readonly errors: RowError[];
  /** How many row problems there are in all (`errors` lists at most maxErrors of them). */
  readonly errorCount: number;
  /** Problems with the mapping itself (missing column, unknown unit), keyed by field. */
  readonly mappingErrors: Partial<Record<ReadingColumnField | `units.${ReadingUnitField}` | 'rows', string>>;
  /** Units used per field (chosen, or read from the header). */
  readonly units: Partial<Record<ReadingUnitField, string>>;
}

/** Largest wet thickness a gauge reading may claim [m] (0.1 m: far above any coating or cast film). */
export const MAX_READING_THICKNESS = 0.1;
/** Largest number of data rows in one upload. */
export const MAX_READING_ROWS = 200_000;

const HEADER_UNIT = /[[(]\s*([^\])]+?)\s*[\])]\s*$/;

/**
 * The unit written in a column header, e.g. "thickness [µm]" → "µm", "T air (°F)" → "°F".
 *
 * @param header - the header text
 * @returns the unit text, or null when the header names none
 * @example unitFromHeader('thickness [mil]') // 'mil'
 */
export function unitFromHeader(header: string): string | null {
  const match = HEADER_UNIT.exec(header);
  return match ? match[1] : null;
}

const FIELD_PATTERNS: readonly [ReadingColumnField, RegExp][] = [
  ['substrateTemperature', /substrate|plate|web\s*temp|t[_ ]?sub/i],
  ['airTemperature', /\bair\b|t[_ ]?air|ambient/i],
  ['thickness', /thick|wft|dft|film|gauge|reading/i],
  ['run', /\brun\b|batch|\blot\b|roll/i],
  ['position', /posit|distance|\bpos\b|\bm\b|length|metre|meter/i],
  ['time', /time|date|stamp/i],
  ['direction', /direction|\bdir\b|md\s*\/\s*cd|orient/i],
  ['operator', /operator|technician|\bby\b|initials/i],
];

/**
 * Guess which header feeds which field from the header words (a person confirms it in the preview).
 *
 * @param headers - the header row
 * @returns a mapping with the guessed columns and the units read from the headers
 * @example detectReadingMapping(['Run', 'Position [m]', 'WFT [µm]']).columns.thickness // 'WFT [µm]'
 */
export function detectReadingMapping(headers: readonly string[]): ReadingColumnMapping {
  const columns: Partial<Record<ReadingColumnField, string>> = {};
  const used = new Set<string>();
  for (const [field, pattern] of FIELD_PATTERNS) {
    const header = headers.find((h) => !used.has(h) && pattern.test(h.replace(HEADER_UNIT, '')));
    if (header !== undefined) {
      columns[field] = header;
      used.add(header);
    }
  }
  // A header that names no field but carries a film-thickness unit (µm, mil, mm) is the thickness.
  if (columns.thickness === undefined) {
    const header = headers.find((h) => {
      const unit = unitFromHeader(h);
      if (used.has(h) || unit === null || unit.trim() === 'm') return false;
      try {
        resolveUnit(unit, 'length');
        return true;
      } catch {
        return false;
      }
    });
    if (header !== undefined) columns.thickness = header;
  }
  const units: Partial<Record<ReadingUnitField, string>> = {};
  for (const field of Object.keys(readingUnitKinds) as ReadingUnitField[]) {
    const header = columns[field];
    const unit = header === undefined ? null : unitFromHeader(header);
    if (unit !== null) units[field] = unit;
  }
  return { columns, units };
}

/** A linear map value → SI for one unit (exact factors come from the units layer; offsets for °C/°F). */
function siMap(unit: string, kind: QuantityKind): { scale: number; offset: number } {
  if (kind === 'temperature') {
    const a = toSi(300, unit, 'temperature');
    const b = toSi(400, unit, 'temperature');
    const scale = (b - a) / 100;
    return { scale, offset: a - 300 * scale };
  }
  return { scale: toSi(1, unit, kind), offset: 0 };
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Read gauge rows (already split into cells) into readings, checking every cell and naming the
 * line and column of each problem.
 *
 * ## Method
 * Each unit is resolved once per column and applied as a linear map to SI (factors from the
 * units layer: 1 mil = 25.4 µm exactly, °F → K with its offset; NIST SP 811 App. B). Dry readings
 * become wet thickness through volume solids, WFT = DFT/VS' with VS' = VS/(1 + T). Directions read
 * MD/machine and CD/TD/cross. Times read ISO 8601; a time without a zone is refused (ambiguous).
 * Blank lines are skipped. Nothing is partly accepted: callers save only when `errors` and
 * `mappingErrors` are both empty.
 *
 * @param headers - the header row (line 1)
 * @param rows - data rows, rows[i] is line i + 2
 * @param mapping - columns and units
 * @param basis - wet, or dry with volume solids and thinner
 * @param options - maxErrors: stop listing after this many (default 200)
 * @returns readings, row errors and mapping errors
 * @example readReadingRows(['run','pos [m]','t [mil]'], [['R1','0','4']], mapping, { kind: 'wet' }).readings[0].wetThickness // 1.016e-4
 */
export function readReadingRows(
  headers: readonly string[],
  rows: readonly (readonly string[])[],
  mapping: ReadingColumnMapping,
  basis: ThicknessBasis,
  options: { maxErrors?: number } = {},
): ReadRowsResult {
  const maxErrors = options.maxErrors ?? 200;
  const mappingErrors: ReadRowsResult['mappingErrors'] = {};
  const index: Partial<Record<ReadingColumnField, number>> = {};
  for (const field of readingColumnFields) {
    const header = mapping.columns[field];
    if (header === undefined || header === '') continue;
    const i = headers.indexOf(header);
    if (i === -1) mappingErrors[field] = `column "${header}" is not in the file's header`;
    else index[field] = i;
  }
  if (mapping.columns.run === undefined) mappingErrors.run = 'choose the column with the run or batch id';
  if (mapping.columns.thickness === undefined) mappingErrors.thickness = 'choose the column with the thickness readings';
  if (mapping.columns.position === undefined && mapping.columns.time === undefined) {
    mappingErrors.position = 'choose a position or a time column (the chart needs one of them)';
  }
  const units: Partial<Record<ReadingUnitField, string>> = {};
  const maps: Partial<Record<ReadingUnitField, { scale: number; offset: number }>> = {};
  for (const [field, kind] of Object.entries(readingUnitKinds) as [ReadingUnitField, QuantityKind][]) {
    const header = mapping.columns[field];
    if (header === undefined) continue;
    const unit = mapping.units[field] ?? unitFromHeader(header) ?? (field === 'position' ? 'm' : undefined);
    if (unit === undefined) {
      mappingErrors[`units.${field}`] = `choose the unit of "${header}" or write it in the header, e.g. "${field === 'thickness' ? 'thickness [µm]' : 'air [°C]'}"`;
      continue;
    }
    try {
      resolveUnit(unit, kind);
      maps[field] = siMap(unit, kind);
      units[field] = unit;
    } catch (error) {
      mappingErrors[`units.${field}`] = (error as Error).message;
    }
  }
  if (rows.length > MAX_READING_ROWS) mappingErrors.rows = `a file may hold at most ${MAX_READING_ROWS.toLocaleString('en-US')} readings; this one has ${rows.length.toLocaleString('en-US')}`;
  if (Object.keys(mappingErrors).length > 0) return { readings: [], errors: [], errorCount: 0, mappingErrors, units };

  const errors: RowError[] = [];
  const readings: ReadReading[] = [];
  let errorCount = 0;
  const fail = (line: number, field: ReadingColumnField | null, message: string) => {
    errorCount += 1;
    if (errors.length < maxErrors) errors.push({ line, column: field === null ? null : (mapping.columns[field] ?? field), message });
  };
  const cell = (row: readonly string[], field: ReadingColumnField): string => {
    const i = index[field];
    return i === undefined ? '' : (row[i] ?? '').trim();
  };
  const number = (row: readonly string[], line: number, field: ReadingColumnField, what: string): number | null | undefined => {
    const text = cell(row, field);
    if (text === '') return null;
    if (!NUMBER.test(text)) {
      fail(line, field, `${what} must be a number (use a point for decimals), got "${text.slice(0, 40)}"`);
      return undefined;
    }
    return Number(text);
  };
  const thicknessUnit = units.thickness as string;

  for (let r = 0; r < rows.length; r += 1) {
    const row = rows[r];
    const line = r + 2;
    if (row.every((c) => c.trim() === '')) continue;
    if (row.length !== headers.length) {
      fail(line, null, `the row has ${row.length} cells; the header has ${headers.length}`);
      continue;
    }
    let ok = true;
    const run = cell(row, 'run');
    if (run === '') {
      fail(line, 'run', 'run is required');
      ok = false;
    } else if (run.length > 80) {
      fail(line, 'run', 'run must be at most 80 characters');
      ok = false;
    }
    const entered = number(row, line, 'thickness', 'thickness');
    let wet: number | null = null;
    if (entered === null) {
      fail(line, 'thickness', 'thickness is required');
      ok = false;
    } else if (entered !== undefined) {
      const si = entered * maps.thickness!.scale;
      if (!(si > 0) || si > MAX_READING_THICKNESS) {
        fail(line, 'thickness', `thickness must be > 0 and ≤ ${MAX_READING_THICKNESS} m; got ${entered} ${thicknessUnit}`);
        ok = false;
      } else {
        wet = basis.kind === 'dry' ? wetThicknessFromDry(si, basis.volumeSolids, basis.thinner) : si;
        if (wet > MAX_READING_THICKNESS) {
          fail(line, 'thickness', `the wet thickness from this dry reading is above ${MAX_READING_THICKNESS} m`);
          ok = false;
        }
      }
    } else ok = false;

    let position: number | null = null;
    if (index.position !== undefined) {
      const p = number(row, line, 'position', 'position');
      if (p === undefined) ok = false;
      else if (p !== null) {
        position = p * maps.position!.scale;
        if (Math.abs(position) > 1e7) {
          fail(line, 'position', 'position must lie within ±10,000 km');
          ok = false;
        }
      }
    }
    let measuredAt: number | null = null;
    if (index.time !== undefined) {
      const text = cell(row, 'time');
      if (text !== '') {
        if (!/^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/i.test(text)) {
          fail(line, 'time', `time must be an ISO 8601 date and time with its zone, e.g. 2026-03-05T14:02:10Z; got "${text.slice(0, 40)}"`);
          ok = false;
        } else {
          measuredAt = Date.parse(text.replace(' ', 'T'));
          if (!Number.isFinite(measuredAt)) {
            fail(line, 'time', `time "${text.slice(0, 40)}" is not a real date and time`);
            ok = false;
          }
        }
      }
    }
    if (ok && position === null && measuredAt === null) {
      fail(line, index.position !== undefined ? 'position' : 'time', 'each reading needs a position or a time');
      ok = false;
    }
    let direction: ReadReading['direction'] = null;
    if (index.direction !== undefined) {
      const text = cell(row, 'direction').toLowerCase();
      if (text === 'md' || text === 'machine') direction = 'md';
      else if (text === 'cd' || text === 'td' || text === 'cross') direction = 'cd';
      else if (text !== '') {
        fail(line, 'direction', `direction must be MD or CD, got "${text.slice(0, 20)}"`);
        ok = false;
      }
    }
    const temperature = (field: 'substrateTemperature' | 'airTemperature', what: string): number | null => {
      if (index[field] === undefined) return null;
      const value = number(row, line, field, what);
      if (value === undefined) {
        ok = false;
        return null;
      }
      if (value === null) return null;
      const si = value * maps[field]!.scale + maps[field]!.offset;
      if (!(si > 0) || si > 5000) {
        fail(line, field, `${what} must be above absolute zero and ≤ 5000 K; got ${value} ${units[field]}`);
        ok = false;
        return null;
      }
      return si;
    };
    const substrateTemperature = temperature('substrateTemperature', 'substrate temperature');
    const airTemperature = temperature('airTemperature', 'air temperature');
    const operator = cell(row, 'operator');
    if (operator.length > 120) {
      fail(line, 'operator', 'operator must be at most 120 characters');
      ok = false;
    }
    if (!ok || wet === null || entered === null || entered === undefined) continue;
    readings.push({
      line,
      run,
      position,
      measuredAt,
      direction,
      enteredThickness: entered,
      enteredUnit: thicknessUnit,
      wetThickness: wet,
      substrateTemperature,
      airTemperature,
      operator: operator === '' ? null : operator,
    });
  }
  if (readings.length === 0 && errors.length === 0) {
    return { readings, errors, errorCount, mappingErrors: { rows: 'the file has no readings below its header' }, units };
  }
  return { readings, errors, errorCount, mappingErrors: {}, units };
}
