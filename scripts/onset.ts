/**
 * `npm run --silent onset -- FILE`: evaluate onset cases in batch.
 *
 * FILE is .csv (header row, one case per row) or .json (an array of case objects). Results go to
 * standard output in the same format, one per case and in order (CSV with a header; JSON array).
 * Field names and meanings: shared/schemas/onset.ts. All the physics is in
 * shared/physics/batch/evaluate-case.ts; this script only reads and writes.
 *
 * Exit status: 0 when every case was computed, 1 when any case has an error, 2 when the file cannot
 * be read (missing, unreadable, not CSV or JSON, malformed JSON, not an array, no header row).
 */
import { readFileSync } from 'node:fs';
import { extname } from 'node:path';
import Papa from 'papaparse';
import { evaluateCase } from '../shared/physics/batch/evaluate-case';
import { onsetCaseResultFields, type OnsetCaseResult } from '../shared/schemas/onset';

class UnreadableFileError extends Error {}

function readCases(file: string): { format: 'csv' | 'json'; cases: unknown[] } {
  const extension = extname(file).toLowerCase();
  if (extension !== '.csv' && extension !== '.json') {
    throw new UnreadableFileError(`${file}: expected a .csv or .json file, got "${extension || 'no extension'}"`);
  }
  let text: string;
  try {
    text = readFileSync(file, 'utf8').replace(/^\uFEFF/, '');
  } catch (error) {
    throw new UnreadableFileError(`${file}: cannot read the file (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  if (extension === '.json') {
    let data: unknown;
    try {
      data = JSON.parse(text);
    } catch (error) {
      throw new UnreadableFileError(`${file}: not valid JSON (${(error as Error).message})`);
    }
    if (!Array.isArray(data)) throw new UnreadableFileError(`${file}: expected a JSON array of cases`);
    return { format: 'json', cases: data };
  }
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim() });
  if (!parsed.meta.fields || parsed.meta.fields.length === 0 || parsed.meta.fields.every((f) => f === '')) {
    throw new UnreadableFileError(`${file}: no header row`);
  }
  return { format: 'csv', cases: parsed.data };
}

function csvCell(value: OnsetCaseResult[keyof OnsetCaseResult]): string {
  if (value === null) return '';
  return String(value);
}

function main(): number {
  const file = process.argv[2];
  if (!file) {
    process.stderr.write('usage: npm run --silent onset -- FILE.csv|FILE.json\n');
    return 2;
  }
  let input: ReturnType<typeof readCases>;
  try {
    input = readCases(file);
  } catch (error) {
    if (error instanceof UnreadableFileError) {
      process.stderr.write(`onset: ${error.message}\n`);
      return 2;
    }
    throw error;
  }
  const results = input.cases.map((raw) => evaluateCase(raw));
  if (input.format === 'json') {
    const ordered = results.map((r) => Object.fromEntries(onsetCaseResultFields.map((field) => [field, r[field]])));
    process.stdout.write(`${JSON.stringify(ordered, null, 2)}\n`);
  } else {
    const rows = results.map((r) => onsetCaseResultFields.map((field) => csvCell(r[field])));
    process.stdout.write(`${Papa.unparse({ fields: [...onsetCaseResultFields], data: rows }, { newline: '\n' })}\n`);
  }
  const failed = results.filter((r) => r.error !== null).length;
  if (failed > 0) process.stderr.write(`onset: ${failed} of ${results.length} case(s) failed; see the error field\n`);
  return failed > 0 ? 1 : 0;
}

process.exitCode = main();
