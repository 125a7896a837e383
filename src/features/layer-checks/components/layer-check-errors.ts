import type { z } from 'zod';
import { isApiError } from '../../../lib/api-client';
import { fieldForInputPath, type LayerCheckField } from './layer-check-form-values';

export interface PlacedErrors {
  /** Messages that have a box to sit beside. */
  fields: Partial<Record<LayerCheckField, string>>;
  /** Messages with no box (shown above the form), with their input path. */
  other: string[];
}

function place(entries: [string, string][]): PlacedErrors {
  const placed: PlacedErrors = { fields: {}, other: [] };
  for (const [path, message] of entries) {
    const field = fieldForInputPath(path);
    if (field && !placed.fields[field]) placed.fields[field] = message;
    else placed.other.push(path ? `${path}: ${message}` : message);
  }
  return placed;
}

/** The server's field errors (dotted input paths) placed beside the form's boxes. */
export function placeServerErrors(error: unknown): PlacedErrors | undefined {
  if (!isApiError(error)) return undefined;
  const entries = Object.entries(error.fields ?? {});
  if (entries.length === 0) return { fields: {}, other: [error.message] };
  return place(entries);
}

/** The same for a failed check against the shared schema before saving. */
export function placeSchemaErrors(error: z.ZodError): PlacedErrors {
  return place(error.issues.map((issue) => [issue.path.join('.'), issue.message]));
}
