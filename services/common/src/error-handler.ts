import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ApiError, errorBody } from './errors.js';

/** Unknown routes under /api answer 404 in the error shape. */
export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No route ${req.method} ${req.path}.` } });
};

type BodyParserError = Error & { type?: string; status?: number; limit?: number };

/** One place turns every error into the API error shape; stacks stay in the log. */
export function errorHandler(log: (msg: string, err: unknown) => void = defaultLog): ErrorRequestHandler {
  return (err, req, res, _next) => {
    // A refusal sent while the body is still arriving makes Node close the connection under the
    // sender, and a proxy in front then sees a reset, not our answer: read the rest first (the
    // gateway caps bodies, so this is bounded), then answer.
    if (!req.complete && req.readable) {
      const answer = () => writeError(err, res, log);
      const timer = setTimeout(answer, 5000);
      req.once('end', () => (clearTimeout(timer), answer()));
      req.once('error', () => (clearTimeout(timer), answer()));
      req.resume();
      return;
    }
    writeError(err, res, log);
  };
}

/** Writes the error shape once; a second call (the drain's timer racing its end) finds the answer sent. */
function writeError(err: unknown, res: Parameters<ErrorRequestHandler>[2], log: (msg: string, err: unknown) => void): void {
  if (res.headersSent) return;
  if (err instanceof ApiError) {
    res.status(err.status).json(errorBody(err));
    return;
  }
  const parserError = err as BodyParserError;
  if (parserError?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'invalid_json', message: 'The body is not valid JSON.', field: 'body' } });
    return;
  }
  if (parserError?.type === 'entity.too.large') {
    res
      .status(413)
      .json({ error: { code: 'too_large', message: `The body is larger than the limit of ${parserError.limit} bytes.` } });
    return;
  }
  if (parserError?.type === 'encoding.unsupported' || parserError?.type === 'charset.unsupported') {
    res.status(415).json({ error: { code: 'unsupported_encoding', message: parserError.message } });
    return;
  }
  if (typeof parserError?.status === 'number' && parserError.status >= 400 && parserError.status < 500) {
    res.status(parserError.status).json({ error: { code: 'bad_request', message: parserError.message } });
    return;
  }
  log('unhandled error', err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; it has been logged.' } });
}

function defaultLog(msg: string, err: unknown): void {
  console.error(`[error] ${msg}:`, err);
}
