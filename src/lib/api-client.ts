import type { z } from 'zod';
import { apiErrorBodySchema } from '../../shared/schemas/api-error';

/**
 * A failed API call, carrying the server's `{ error: { code, message, fields? } }` body.
 * `fields` maps a field path ("email", "rows.3.depth") to the message for that field.
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields?: Record<string, string>;

  constructor(options: { status: number; code: string; message: string; fields?: Record<string, string> }) {
    super(options.message);
    this.name = 'ApiError';
    this.status = options.status;
    this.code = options.code;
    this.fields = options.fields;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Query values that may be sent; undefined, null and '' are left out of the URL. */
export type QueryParams = Record<string, string | number | boolean | undefined | null>;

const API_BASE = '/api';

/** Builds `/api/<path>?a=1&b=2`, dropping empty values so filters that are not set are not sent. */
export function buildApiUrl(path: string, query?: QueryParams): string {
  const cleanPath = path.startsWith('/') ? path : `/${path}`;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === '') continue;
    search.set(key, String(value));
  }
  const text = search.toString();
  return `${API_BASE}${cleanPath}${text ? `?${text}` : ''}`;
}

/**
 * Turns a failed response into an ApiError. Bodies that do not follow the error shape
 * (a proxy's HTML page, an empty body) still give a status and a readable message.
 */
export function toApiError(status: number, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError({ status, code, message, fields });
  }
  return new ApiError({
    status,
    code: status >= 500 ? 'server_error' : 'http_error',
    message: status >= 500 ? `The server could not answer (HTTP ${status}). Try again shortly.` : `The request failed (HTTP ${status}).`,
  });
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

interface RequestOptions<S extends z.ZodType | undefined> {
  body?: unknown;
  query?: QueryParams;
  schema?: S;
  signal?: AbortSignal;
}

type Result<S> = S extends z.ZodType ? z.infer<S> : unknown;

async function readJson(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

async function request<S extends z.ZodType | undefined = undefined>(
  method: Method,
  path: string,
  options: RequestOptions<S> = {},
): Promise<Result<S>> {
  let response: Response;
  try {
    response = await fetch(buildApiUrl(path, options.query), {
      method,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        ...(options.body !== undefined ? { 'Content-Type': 'application/json' } : {}),
      },
      body: options.body !== undefined ? JSON.stringify(options.body) : undefined,
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({ status: 0, code: 'network_error', message: 'QuietLayer could not reach its server. Check the connection and try again.' });
  }
  const body = await readJson(response);
  if (!response.ok) throw toApiError(response.status, body);
  return (options.schema ? options.schema.parse(body) : body) as Result<S>;
}

/** The one way the client talks to the server. No toasts, no redirects: callers decide. */
export const api = {
  get: <S extends z.ZodType | undefined = undefined>(path: string, query?: QueryParams, options: { schema?: S; signal?: AbortSignal } = {}) =>
    request<S>('GET', path, { query, ...options }),
  post: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, options: { schema?: S; signal?: AbortSignal } = {}) =>
    request<S>('POST', path, { body, ...options }),
  put: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, options: { schema?: S } = {}) =>
    request<S>('PUT', path, { body, ...options }),
  patch: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, options: { schema?: S } = {}) =>
    request<S>('PATCH', path, { body, ...options }),
  delete: <S extends z.ZodType | undefined = undefined>(path: string, query?: QueryParams, options: { schema?: S } = {}) =>
    request<S>('DELETE', path, { query, ...options }),
};
