import Papa from 'papaparse';

export interface CaseFile {
  format: 'csv' | 'json';
  cases: Record<string, unknown>[];
  /** Line (CSV) or array position (JSON, 1-based) of each case, for messages. */
  where: string[];
}

/**
 * Reads an uploaded batch file the way the `onset` command does: CSV with a header row (one case per
 * row) or a JSON array of case objects ({ "cases": [...] } is accepted too). Throws an Error whose
 * message says what is wrong with the file as a whole.
 */
export function readCaseFile(name: string, text: string): CaseFile {
  const clean = text.replace(/^\uFEFF/, '');
  const isJson = name.toLowerCase().endsWith('.json') || /^\s*[[{]/.test(clean);
  if (isJson) {
    let data: unknown;
    try {
      data = JSON.parse(clean);
    } catch (error) {
      throw new Error(`${name}: not valid JSON (${(error as Error).message})`);
    }
    const list = Array.isArray(data) ? data : data && typeof data === 'object' && Array.isArray((data as { cases?: unknown }).cases) ? (data as { cases: unknown[] }).cases : undefined;
    if (!list) throw new Error(`${name}: expected a JSON array of cases`);
    const cases = list.map((item, index) => {
      if (!item || typeof item !== 'object' || Array.isArray(item)) throw new Error(`${name}: element ${index + 1} is not an object with case fields`);
      return item as Record<string, unknown>;
    });
    return { format: 'json', cases, where: cases.map((_, index) => `element ${index + 1}`) };
  }
  const parsed = Papa.parse<Record<string, string>>(clean, { header: true, skipEmptyLines: 'greedy', transformHeader: (header) => header.trim() });
  if (!parsed.meta.fields || parsed.meta.fields.every((field) => field === '')) throw new Error(`${name}: no header row`);
  const structural = parsed.errors.find((error) => error.type === 'Quotes');
  if (structural) throw new Error(`${name}: line ${(structural.row ?? 0) + 2}: ${structural.message}`);
  // Papa gives no per-row line numbers with blank lines skipped; count the data rows after the header.
  return { format: 'csv', cases: parsed.data, where: parsed.data.map((_, index) => `row ${index + 1} (line ${index + 2})`) };
}
