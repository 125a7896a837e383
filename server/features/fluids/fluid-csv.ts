import Papa from 'papaparse';
import { readFluidInput, type ReadFluid } from '../../../shared/fluids/read-fluid-input';
import { fluidCsvColumns, fluidInputSchema, type CsvLineError, type FluidInput } from '../../../shared/schemas/fluids';
import { fieldsFromZodError } from '../../middleware/error-handler';

/** Input property key ↔ CSV column stem. */
const propertyColumns = {
  density: 'density',
  expansion: 'expansion',
  surfaceTension: 'surface_tension',
  surfaceTensionSlope: 'surface_tension_slope',
  conductivity: 'conductivity',
  heatCapacity: 'heat_capacity',
  thermalDiffusivity: 'thermal_diffusivity',
  soluteDiffusivity: 'solute_diffusivity',
  soluteSurfaceTensionSlope: 'solute_surface_tension_slope',
} as const;
type PropertyKey = keyof typeof propertyColumns;
const requiredProperties: ReadonlySet<PropertyKey> = new Set(['density', 'expansion', 'surfaceTension', 'surfaceTensionSlope', 'conductivity']);

/** Writes fluids (as inputs) to CSV with the fixed columns, header first. */
export function fluidsToCsv(inputs: FluidInput[]): string {
  const rows = inputs.map((input) => {
    const row: Record<string, string> = Object.fromEntries(fluidCsvColumns.map((c) => [c, '']));
    row.name = input.name;
    row.kind = input.kind;
    row.reference_temperature = input.referenceTemperature;
    row.valid_from = input.validFrom ?? '';
    row.valid_to = input.validTo ?? '';
    row.notes = input.notes ?? '';
    for (const [key, stem] of Object.entries(propertyColumns) as [PropertyKey, string][]) {
      const p = input[key];
      if (!p) continue;
      row[stem] = p.value;
      row[`${stem}_source`] = p.source ?? '';
      row[`${stem}_uncertainty_pct`] = String(p.uncertaintyPercent ?? 0);
      row[`${stem}_distribution`] = p.distribution ?? 'normal';
    }
    const v = input.viscosity;
    if (v.law === 'points') row.viscosity_points = v.points.map((p) => `${p.temperature} = ${p.value}`).join('; ');
    else {
      row.viscosity_a = v.preExponential;
      row.viscosity_b = v.activationTemperature;
    }
    row.viscosity_source = v.source ?? '';
    row.viscosity_uncertainty_pct = String(v.uncertaintyPercent ?? 0);
    row.viscosity_distribution = v.distribution ?? 'normal';
    return fluidCsvColumns.map((c) => row[c]);
  });
  // escapeFormulae: a cell starting with = + - @ tab or CR gets a leading ' so a spreadsheet shows it as
  // text, never runs it (OWASP, "CSV Injection"); parseFluidCsv drops that ' again on import.
  return Papa.unparse({ fields: [...fluidCsvColumns], data: rows }, { newline: '\r\n', escapeFormulae: true });
}

/** Dotted input path → the CSV column a person should look at. */
export function csvColumnOf(path: string): string {
  const parts = path.split('.');
  const head = parts[0];
  if (head === 'referenceTemperature') return 'reference_temperature';
  if (head === 'validFrom') return 'valid_from';
  if (head === 'validTo') return 'valid_to';
  if (head === 'viscosity') {
    if (parts[1] === 'preExponential') return 'viscosity_a';
    if (parts[1] === 'activationTemperature') return 'viscosity_b';
    if (parts[1] === 'source') return 'viscosity_source';
    if (parts[1] === 'uncertaintyPercent') return 'viscosity_uncertainty_pct';
    if (parts[1] === 'distribution') return 'viscosity_distribution';
    return 'viscosity_points';
  }
  if (head in propertyColumns) {
    const stem = propertyColumns[head as PropertyKey];
    if (parts[1] === 'source') return `${stem}_source`;
    if (parts[1] === 'uncertaintyPercent') return `${stem}_uncertainty_pct`;
    if (parts[1] === 'distribution') return `${stem}_distribution`;
    return stem;
  }
  return head;
}

export interface ParsedCsvRow {
  line: number;
  name: string;
  kind: string;
  fluid: ReadFluid | null;
  errors: CsvLineError[];
}

/**
 * Reads a fluid CSV (header row with the export's column names, in any order; unknown columns are
 * refused) into fluids, with every problem tied to its 1-based line number in the file.
 */
export function parseFluidCsv(text: string): { columns: string[]; rows: ParsedCsvRow[]; errors: CsvLineError[] } {
  const lineStarts = [0];
  for (let i = 0; i < text.length; i += 1) if (text[i] === '\n') lineStarts.push(i + 1);
  const lineOf = (offset: number) => {
    let lo = 0;
    let hi = lineStarts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (lineStarts[mid] <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
  const records: { line: number; cells: string[] }[] = [];
  const parseErrors: CsvLineError[] = [];
  let cursor = 0;
  Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
    header: false,
    skipEmptyLines: false,
    step: (result) => {
      const start = cursor;
      cursor = result.meta.cursor;
      // skip leading newline characters belonging to the previous row's terminator
      let first = start;
      while (first < text.length && (text[first] === '\n' || text[first] === '\r')) first += 1;
      const line = lineOf(Math.min(first, Math.max(0, text.length - 1)));
      for (const e of result.errors) parseErrors.push({ line, field: '', message: e.message });
      const cells = result.data;
      if (cells.length === 1 && cells[0].trim() === '') return;
      records.push({ line, cells });
    },
  });
  if (records.length === 0) return { columns: [], rows: [], errors: [{ line: 1, field: '', message: 'the file has no header row' }] };
  const header = records[0].cells.map((c) => c.trim());
  const errors: CsvLineError[] = [...parseErrors];
  const known = new Set<string>(fluidCsvColumns);
  for (const column of header) {
    if (!known.has(column)) errors.push({ line: records[0].line, field: column, message: `unknown column "${column}"; expected columns such as ${fluidCsvColumns.slice(0, 6).join(', ')}` });
  }
  for (const required of ['name', 'kind', 'reference_temperature']) {
    if (!header.includes(required)) errors.push({ line: records[0].line, field: required, message: `the header has no "${required}" column` });
  }
  const rows: ParsedCsvRow[] = [];
  for (const record of records.slice(1)) {
    const cell = (column: string) => {
      const index = header.indexOf(column);
      return index >= 0 && index < record.cells.length ? record.cells[index].replace(/^'(?=[=+\-@\t\r])/, '').trim() : '';
    };
    const rowErrors: CsvLineError[] = [];
    if (record.cells.length !== header.length) {
      rowErrors.push({ line: record.line, field: '', message: `the line has ${record.cells.length} cells but the header has ${header.length}` });
    }
    const { input, problems } = rowToInput(cell);
    for (const [field, message] of Object.entries(problems)) rowErrors.push({ line: record.line, field, message });
    let fluid: ReadFluid | null = null;
    if (rowErrors.length === 0) {
      const parsed = fluidInputSchema.safeParse(input);
      if (!parsed.success) {
        for (const [path, message] of Object.entries(fieldsFromZodError(parsed.error))) {
          rowErrors.push({ line: record.line, field: csvColumnOf(path), message: `${csvColumnOf(path)}: ${message}` });
        }
      } else {
        const read = readFluidInput(parsed.data);
        if (read.ok) fluid = read.fluid;
        else for (const [path, message] of Object.entries(read.fields)) rowErrors.push({ line: record.line, field: csvColumnOf(path), message });
      }
    }
    errors.push(...rowErrors);
    rows.push({ line: record.line, name: cell('name'), kind: cell('kind'), fluid, errors: rowErrors });
  }
  if (rows.length === 0) errors.push({ line: records[0].line, field: '', message: 'the file has a header but no fluids' });
  return { columns: header, rows, errors };
}

function rowToInput(cell: (column: string) => string): { input: Record<string, unknown>; problems: Record<string, string> } {
  const problems: Record<string, string> = {};
  const uncertainty = (column: string): number | undefined => {
    const raw = cell(column);
    if (raw === '') return undefined;
    const n = Number(raw.replace(/%$/, ''));
    if (!Number.isFinite(n)) problems[column] = `${column} must be a number of percent, got "${raw}"`;
    return n;
  };
  const distribution = (column: string): string | undefined => cell(column) || undefined;
  const input: Record<string, unknown> = {
    name: cell('name'),
    kind: cell('kind'),
    notes: cell('notes'),
    referenceTemperature: cell('reference_temperature'),
  };
  if (cell('valid_from')) input.validFrom = cell('valid_from');
  if (cell('valid_to')) input.validTo = cell('valid_to');
  for (const [key, stem] of Object.entries(propertyColumns) as [PropertyKey, string][]) {
    const value = cell(stem);
    if (value === '') {
      if (requiredProperties.has(key)) problems[stem] = `${stem} is required`;
      continue;
    }
    input[key] = {
      value,
      source: cell(`${stem}_source`),
      ...(uncertainty(`${stem}_uncertainty_pct`) !== undefined ? { uncertaintyPercent: uncertainty(`${stem}_uncertainty_pct`) } : {}),
      ...(distribution(`${stem}_distribution`) ? { distribution: distribution(`${stem}_distribution`) } : {}),
    };
  }
  const common = {
    source: cell('viscosity_source'),
    ...(uncertainty('viscosity_uncertainty_pct') !== undefined ? { uncertaintyPercent: uncertainty('viscosity_uncertainty_pct') } : {}),
    ...(distribution('viscosity_distribution') ? { distribution: distribution('viscosity_distribution') } : {}),
  };
  const pointsText = cell('viscosity_points');
  if (pointsText) {
    const points = pointsText
      .split(';')
      .map((part) => part.trim())
      .filter((part) => part !== '')
      .map((part) => {
        const [temperature, value, extra] = part.split('=').map((s) => s.trim());
        if (!temperature || !value || extra !== undefined) problems.viscosity_points = `write viscosity points as "20 °C = 1.002 mPa·s; 40 °C = 0.653 mPa·s", got "${part}"`;
        return { temperature: temperature ?? '', value: value ?? '' };
      });
    input.viscosity = { law: 'points', points, ...common };
  } else if (cell('viscosity_a') || cell('viscosity_b')) {
    input.viscosity = { law: 'andrade', preExponential: cell('viscosity_a'), activationTemperature: cell('viscosity_b'), ...common };
  } else {
    problems.viscosity_points = 'give viscosity_points (or viscosity_a and viscosity_b)';
  }
  return { input, problems };
}
