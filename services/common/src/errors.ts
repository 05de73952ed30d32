/** Typed errors that the error middleware turns into the API error shape. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export class ValidationError extends ApiError {
  constructor(message: string, field?: string, details?: unknown) {
    super(400, 'invalid_input', message, field, details);
  }
}

export class UnauthorizedError extends ApiError {
  constructor(message = 'Sign in first: this route needs a valid access token or API key.') {
    super(401, 'unauthorized', message);
  }
}

export class ForbiddenError extends ApiError {
  constructor(message = 'Your role may not use this route.') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends ApiError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}

export class ConflictError extends ApiError {
  constructor(message: string, field?: string) {
    super(409, 'conflict', message, field);
  }
}

export class PayloadTooLargeError extends ApiError {
  constructor(message: string) {
    super(413, 'too_large', message);
  }
}

export class UnprocessableError extends ApiError {
  constructor(message: string, field?: string) {
    super(422, 'unprocessable', message, field);
  }
}

export interface ErrorBody {
  error: { code: string; message: string; field?: string; details?: unknown };
}

export function errorBody(err: ApiError): ErrorBody {
  const error: ErrorBody['error'] = { code: err.code, message: err.message };
  if (err.field) error.field = err.field;
  if (err.details !== undefined) error.details = err.details;
  return { error };
}
