/**
 * Errors that services throw. The error handler turns each into
 * `{ error: { code, message, fields? } }` with its status; services never pick status codes themselves.
 */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly fields?: Record<string, string>,
    /** Extra response headers, e.g. Retry-After on 429. */
    public readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class BadRequestError extends AppError {
  constructor(message: string, fields?: Record<string, string>, code = 'invalid_input') {
    super(400, code, message, fields);
  }
}

export class InvalidTokenError extends AppError {
  constructor(message = 'This link is not valid any more: it may have expired or been used already. Ask for a new one.') {
    super(400, 'invalid_token', message, { token: message });
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = 'Please sign in.') {
    super(401, 'unauthenticated', message);
  }
}

export class InvalidCredentialsError extends AppError {
  constructor() {
    super(401, 'invalid_credentials', 'The e-mail or password is not right.');
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'Your role does not allow this.') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends AppError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, fields?: Record<string, string>) {
    super(409, 'conflict', message, fields);
  }
}

export class UnprocessableError extends AppError {
  constructor(message: string, fields?: Record<string, string>) {
    super(422, 'unprocessable', message, fields);
  }
}

export class TooManyRequestsError extends AppError {
  constructor(retryAfterSeconds: number, message = 'Too many attempts. Please wait a little and try again.') {
    super(429, 'too_many_requests', message, undefined, { 'Retry-After': String(Math.max(1, Math.ceil(retryAfterSeconds))) });
  }
}

export class UnavailableError extends AppError {
  constructor(message = 'The database cannot be reached just now. Please try again shortly.') {
    super(503, 'unavailable', message);
  }
}
