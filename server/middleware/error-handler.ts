import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import type { Logger } from '../logger';

/** Turns zod issues into `{ "dotted.path": "message" }`, the first message per field. */
export function fieldsFromZodError(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    let path = issue.path.map(String).join('.');
    let message = issue.message;
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        const keyPath = path ? `${path}.${key}` : key;
        fields[keyPath] ??= `${key} is not an accepted field`;
      }
      continue;
    }
    if (path === '') {
      path = '_';
      // express.json leaves the body undefined when it is missing or not sent as application/json.
      if (issue.code === 'invalid_type') message = 'The request body must be a JSON object (Content-Type: application/json).';
    }
    if (issue.code === 'invalid_type' && /received undefined/.test(message)) message = `${path} is required`;
    fields[path] ??= message;
  }
  return fields;
}

const PG_CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', '57P01', '57P02', '57P03', '53300']);

/** pg reports a dead or unreachable server in several ways; all of them mean "database down". */
export function isDatabaseUnavailable(error: unknown): boolean {
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current && typeof current === 'object'; depth += 1) {
    const candidate = current as { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown[] };
    const code = typeof candidate.code === 'string' ? candidate.code : '';
    const message = typeof candidate.message === 'string' ? candidate.message : '';
    if (PG_CONNECTION_CODES.has(code) || code.startsWith('08')) return true;
    if (/timeout exceeded when trying to connect|Connection terminated|connect ECONNREFUSED/i.test(message)) return true;
    if (Array.isArray(candidate.errors) && candidate.errors.some((e) => isDatabaseUnavailable(e))) return true;
    current = candidate.cause;
  }
  return false;
}

/** The one error handler, registered last. Clients never see stacks or internal messages. */
export function createErrorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, next) => {
    if (res.headersSent) {
      next(error);
      return;
    }
    const send = (status: number, code: string, message: string, fields?: Record<string, string>) => {
      res.status(status).json({ error: fields ? { code, message, fields } : { code, message } });
    };
    if (error instanceof ZodError) {
      send(400, 'invalid_input', 'Some fields need attention.', fieldsFromZodError(error));
      return;
    }
    if (error instanceof AppError) {
      for (const [name, value] of Object.entries(error.headers ?? {})) res.setHeader(name, value);
      send(error.status, error.code, error.message, error.fields);
      return;
    }
    // body-parser errors carry `type` and `status`.
    const type = (error as { type?: string } | null)?.type;
    if (type === 'entity.parse.failed') {
      send(400, 'malformed_json', 'The request body is not valid JSON.');
      return;
    }
    if (type === 'entity.too.large') {
      send(413, 'payload_too_large', 'The request body is too large.');
      return;
    }
    // The client hung up while its body was still arriving, or sent fewer/more bytes than its
    // Content-Length: the client's doing, not ours. Nobody may be listening for the answer.
    if (type === 'request.aborted') {
      (req.log ?? logger).info({ code: 'request_aborted' }, 'client closed the connection before sending the whole body');
      send(400, 'request_aborted', 'The request body was not received in full.');
      return;
    }
    if (type === 'request.size.invalid') {
      (req.log ?? logger).warn({ code: 'request_size_invalid' }, 'request body length did not match Content-Length');
      send(400, 'request_size_invalid', 'The request body length does not match its Content-Length header.');
      return;
    }
    if (type === 'encoding.unsupported' || type === 'charset.unsupported') {
      send(415, 'unsupported_media_type', 'The request body encoding is not supported.');
      return;
    }
    if (isDatabaseUnavailable(error)) {
      (req.log ?? logger).error({ err: error }, 'database unavailable');
      send(503, 'unavailable', 'The database cannot be reached just now. Please try again shortly.');
      return;
    }
    (req.log ?? logger).error({ err: error }, 'unhandled error');
    send(500, 'internal', 'Something went wrong on our side. Please try again; if it keeps happening, tell your administrator.');
  };
}
