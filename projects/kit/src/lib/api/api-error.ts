import { HttpErrorResponse } from '@angular/common/http';

/** An API failure in the shape of `{ error: { code, message, field } }`, plus the HTTP status. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

const FALLBACK_MESSAGES: Record<number, string> = {
  0: 'The server cannot be reached. Check the connection and try again.',
  401: 'Your session has ended. Sign in again.',
  403: 'Your role does not allow this.',
  404: 'That record does not exist (any more).',
  409: 'Someone changed this at the same time. Reload and try again.',
  413: 'That is too large to send.',
  429: 'Too many attempts in a short time. Wait a minute and try again.',
};

/** Turns whatever HttpClient threw into an ApiError with a sentence a person can act on. */
export function toApiError(error: unknown): ApiError {
  if (error instanceof ApiError) return error;
  if (error instanceof HttpErrorResponse) {
    const body = error.error as { error?: { code?: unknown; message?: unknown; field?: unknown } } | null;
    const shaped = body && typeof body === 'object' ? body.error : undefined;
    const code = typeof shaped?.code === 'string' ? shaped.code : httpCode(error.status);
    const field = typeof shaped?.field === 'string' && shaped.field ? shaped.field : undefined;
    const message =
      typeof shaped?.message === 'string' && shaped.message
        ? shaped.message
        : (FALLBACK_MESSAGES[error.status] ?? `The server answered ${error.status}. Try again in a moment.`);
    return new ApiError(error.status, code, message, field);
  }
  const message = error instanceof Error && error.message ? error.message : 'Something went wrong.';
  return new ApiError(0, 'client_error', message);
}

/** One line for an error banner: the message, prefixed with the field at fault when there is one. */
export function describeApiError(error: unknown): string {
  const apiError = toApiError(error);
  if (!apiError.field) return apiError.message;
  const label = humanizeField(apiError.field);
  return apiError.message.toLowerCase().startsWith(label.toLowerCase())
    ? apiError.message
    : `${label}: ${apiError.message}`;
}

/** `tub.lengthIn` → `Tub length in`; good enough for a banner until a form names its own fields. */
export function humanizeField(field: string): string {
  const words = field
    .replace(/[._-]+/g, ' ')
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .trim()
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function httpCode(status: number): string {
  if (status === 0) return 'network_error';
  return `http_${status}`;
}
