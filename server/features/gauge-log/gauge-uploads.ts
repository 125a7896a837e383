import type { Request, Response } from 'express';
import multer from 'multer';
import Papa from 'papaparse';
import { detectReadingMapping, readReadingRows, type ReadRowsResult, type ThicknessBasis } from '../../../shared/gauge/read-reading-rows';
import { uploadOptionsSchema, type UploadPreview } from '../../../shared/schemas/gauge-log';
import { AppError, BadRequestError, UnprocessableError } from '../../errors';
import { fieldsFromZodError } from '../../middleware/error-handler';
import { ZodError, type z } from 'zod';

/** Largest CSV accepted: 20 MB (about 300,000 rows of a typical gauge file). */
export const UPLOAD_LIMIT_BYTES = 20 * 1024 * 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_LIMIT_BYTES, files: 1, fields: 4, fieldSize: 64 * 1024, parts: 6 },
}).single('file');

/**
 * Read the multipart body (field `file` and JSON field `options`) after the route's session and
 * role checks, so nobody without the right can make the server buffer a file.
 */
export async function receiveUpload(req: Request, res: Response): Promise<{ text: string; fileName: string; options: z.output<typeof uploadOptionsSchema> }> {
  if (!req.is('multipart/form-data')) throw new BadRequestError('Send the CSV as multipart/form-data with the file in the field "file".', { file: 'file is required' });
  await new Promise<void>((resolve, reject) => {
    upload(req, res, (error: unknown) => {
      if (!error) return resolve();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          reject(new AppError(413, 'payload_too_large', `The file is larger than ${UPLOAD_LIMIT_BYTES / 1024 / 1024} MB. Split it into smaller files (by run) and upload them one after another.`, { file: 'larger than 20 MB' }));
        } else {
          reject(new BadRequestError(`The upload could not be read: ${error.message}. Send one file in the field "file" and the options as JSON in the field "options".`));
        }
        return;
      }
      // busboy's own errors (malformed part headers, truncated bodies) are the sender's fault.
      reject(new BadRequestError(`The upload could not be read: ${(error as Error).message}. Send one file in the field "file" and the options as JSON in the field "options".`));
    });
  });
  const file = req.file;
  if (!file) throw new BadRequestError('Choose a CSV file to upload.', { file: 'file is required' });
  // The client's file name is shown to people and stored for display; it is never used as a path.
  const fileName = displayFileName(file.originalname);
  let options: z.output<typeof uploadOptionsSchema>;
  try {
    const raw = typeof req.body?.options === 'string' && req.body.options !== '' ? JSON.parse(req.body.options) : {};
    options = uploadOptionsSchema.parse(raw);
  } catch (error) {
    if (error instanceof ZodError) throw new BadRequestError('Some fields need attention.', prefixFields(fieldsFromZodError(error), 'options'));
    throw new BadRequestError('The options field must be JSON.', { options: 'options must be JSON' });
  }
  // Whatever Content-Type the browser claims, the bytes must be UTF-8 text (no NUL bytes).
  if (file.buffer.includes(0)) throw new BadRequestError('The file is not a text CSV file.', { file: 'not a text CSV file' });
  let text = file.buffer.toString('utf8');
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return { text, fileName, options };
}

function prefixFields(fields: Record<string, string>, prefix: string): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [`${prefix}.${k}`, v]));
}

/** A file name safe to show: last path segment, no control characters, at most 200 characters. */
export function displayFileName(original: string | undefined): string {
  const last = (original ?? '').split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const clean = last.replace(/[\u0000-\u001f\u007f]/g, '').trim();
  return (clean === '' ? 'upload.csv' : clean).slice(0, 200);
}

export interface ParsedUpload {
  headers: string[];
  rows: string[][];
  detected: ReturnType<typeof detectReadingMapping>;
  mapping: { columns: Record<string, string>; units: Record<string, string> };
  result: ReadRowsResult;
  /** Row problems in all: the reader's plus the CSV splitter's. */
  errorCount: number;
}

/** Split the CSV (papaparse), pick the mapping (chosen, else detected) and read every row. */
export function parseUpload(text: string, options: z.output<typeof uploadOptionsSchema>): ParsedUpload {
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false, delimiter: '' });
  const all = parsed.data;
  if (all.length === 0 || all[0].every((h) => h.trim() === '')) {
    throw new UnprocessableError('The file is empty: its first line must be a header row.', { file: 'no header row' });
  }
  const headers = all[0].map((h) => h.trim());
  const rows = all.slice(1);
  const detected = detectReadingMapping(headers);
  const chosen = Object.keys(options.columns).length > 0;
  const columns = (chosen ? options.columns : detected.columns) as Record<string, string>;
  const units = { ...(chosen ? {} : detected.units), ...options.units } as Record<string, string>;
  const basis: ThicknessBasis =
    options.thicknessBasis === 'dry'
      ? { kind: 'dry', volumeSolids: (options.volumeSolidsPercent as number) / 100, thinner: options.thinnerPercent / 100 }
      : { kind: 'wet' };
  const result = readReadingRows(headers, rows, { columns, units }, basis);
  // Quote errors from the CSV splitter, with their line numbers (header = line 1).
  const splitterErrors = parsed.errors.filter((e) => e.code !== 'UndetectableDelimiter');
  for (const error of splitterErrors.slice(0, 20).reverse()) {
    result.errors.unshift({ line: (error.row ?? 0) + 1, column: null, message: error.message });
  }
  return {
    headers,
    rows,
    detected: { columns: detected.columns, units: detected.units },
    mapping: { columns, units: { ...units, ...result.units } },
    result,
    errorCount: result.errorCount + splitterErrors.length,
  };
}

export function previewOf(fileName: string, parsed: ParsedUpload, judged: UploadPreview['judged'], counts: UploadPreview['counts']): UploadPreview {
  return {
    fileName,
    headers: parsed.headers,
    detected: parsed.detected as UploadPreview['detected'],
    used: parsed.mapping,
    sampleRows: parsed.rows.slice(0, 10),
    rowCount: parsed.rows.filter((r) => r.some((c) => c.trim() !== '')).length,
    validCount: parsed.result.readings.length,
    errorCount: parsed.errorCount,
    errors: parsed.result.errors,
    mappingErrors: parsed.result.mappingErrors as Record<string, string>,
    judged,
    counts,
  };
}
