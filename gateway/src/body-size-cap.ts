import type { RequestHandler } from 'express';

/** The largest body the gateway forwards: uploads (photos, CSV imports) and everything else. */
export const MAX_UPLOAD_BYTES = 8 * 1024 * 1024;
export const MAX_BODY_BYTES = 1024 * 1024;

/**
 * Refuses an oversized body by its declared length before it is streamed to a service, so a
 * flood of large bodies costs the services nothing. Bodies without a length are still held to
 * each service's own parser limits.
 */
export function bodySizeCap(): RequestHandler {
  return (req, res, next) => {
    const declared = Number(req.header('content-length') ?? 0);
    if (!declared) return next();
    const upload = /^multipart\/form-data|^text\/csv/i.test(req.header('content-type') ?? '');
    const limit = upload ? MAX_UPLOAD_BYTES : MAX_BODY_BYTES;
    if (declared <= limit) return next();
    res.setHeader('connection', 'close');
    res.status(413).json({ error: { code: 'too_large', message: `The body is ${declared} bytes; the limit here is ${limit} bytes.` } });
  };
}
