import http from 'node:http';
import https from 'node:https';
import type { RequestHandler } from 'express';
import { IDENTITY_HEADER, signIdentity, type Identity } from '../../../services/common/src/internal-identity.js';
import type { CalculationMemo } from './calculation-memo.js';
import type { CalculatorCopy, CalculatorPool } from './calculator-pool.js';

export interface CalculatorProxyOptions {
  /** Path prefixes the calculator answers. */
  prefixes: string[];
  /** Longest body passed on; the calculator's own JSON limit is 1 MiB. */
  maxBodyBytes?: number;
  /** A calculation that has not answered by then gets 504, as the other services do (default 30 s; cutting plans take a few). */
  timeoutMs?: number;
  /** Recent answers reused for an identical request; none when absent. */
  memo?: CalculationMemo;
}

/** Tells the caller whether its answer was computed for it or reused from an identical request. */
export const CALCULATION_HEADER = 'x-tw-calculation';

// Hop-by-hop headers belong to one connection, not to the request (RFC 9110, section 7.6.1).
const HOP_BY_HOP = new Set(['connection', 'keep-alive', 'proxy-connection', 'proxy-authenticate', 'proxy-authorization', 'te', 'trailer', 'transfer-encoding', 'upgrade']);

type IdentifiedRequest = http.IncomingMessage & { identity?: Omit<Identity, 'iat'>; originalUrl?: string };

function sendError(res: http.ServerResponse, status: number, code: string, message: string, headers: Record<string, string> = {}): void {
  if (res.headersSent) {
    res.destroy();
    return;
  }
  res.writeHead(status, { 'content-type': 'application/json', ...headers });
  res.end(JSON.stringify({ error: { code, message } }));
}

function readBody(req: http.IncomingMessage, limit: number): Promise<Buffer | 'too_large'> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    let over = false;
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > limit) over = true;
      else chunks.push(chunk);
    });
    req.on('end', () => resolve(over ? 'too_large' : Buffer.concat(chunks)));
    req.on('error', reject);
  });
}

function forwardedHeaders(req: IdentifiedRequest, body: Buffer, internalSecret: string): http.OutgoingHttpHeaders {
  const headers: http.OutgoingHttpHeaders = {};
  for (const [name, value] of Object.entries(req.headers)) {
    if (HOP_BY_HOP.has(name) || name === 'host' || name === 'authorization' || name === 'content-length' || name === IDENTITY_HEADER) continue;
    headers[name] = value;
  }
  const peer = req.socket.remoteAddress ?? '';
  headers['x-forwarded-for'] = req.headers['x-forwarded-for'] ? `${req.headers['x-forwarded-for']}, ${peer}` : peer;
  headers['x-forwarded-proto'] = (req.socket as { encrypted?: boolean }).encrypted ? 'https' : 'http';
  if (req.headers.host) headers['x-forwarded-host'] = req.headers.host;
  headers['content-length'] = body.length;
  if (req.identity) headers[IDENTITY_HEADER] = signIdentity(req.identity, internalSecret);
  return headers;
}

/**
 * Forwards calculator requests to the copies of a CalculatorPool. The body is read first (it is
 * small) so that a request whose copy fails before answering can go once more to another copy:
 * every calculator route computes its answer from the body alone, so repeating one is safe.
 */
export function calculatorProxy(pool: CalculatorPool, internalSecret: string, options: CalculatorProxyOptions): RequestHandler {
  const maxBodyBytes = options.maxBodyBytes ?? 1024 * 1024;
  const timeoutMs = options.timeoutMs ?? 30_000;

  return (expressReq, expressRes, next) => {
    const req = expressReq as IdentifiedRequest;
    const res = expressRes as http.ServerResponse;
    const url = req.originalUrl ?? req.url ?? '/';
    if (!options.prefixes.some((p) => url.startsWith(p))) return next();

    void readBody(req, maxBodyBytes).then(
      (body) => {
        if (body === 'too_large') return sendError(res, 413, 'too_large', `The request body is over ${maxBodyBytes} bytes.`);
        const memo = options.memo;
        const memoKey = memo?.keyFor(req.method ?? 'POST', url, req.identity, body);
        const remembered = memoKey ? memo!.recall(memoKey) : undefined;
        if (remembered) {
          res.writeHead(200, { ...remembered.headers, 'content-length': remembered.body.length, [CALCULATION_HEADER]: 'reused' });
          res.end(remembered.body);
          return;
        }
        const headers = forwardedHeaders(req, body, internalSecret);
        const attempt = (copy: CalculatorCopy | undefined, retried: boolean): void => {
          if (!copy) {
            return sendError(res, 503, 'service_unavailable', 'No calculator is answering just now; try again in a moment.', { 'retry-after': '2' });
          }
          const transport = copy.target.protocol === 'https:' ? https : http;
          const upstream = transport.request({
            protocol: copy.target.protocol,
            hostname: copy.target.hostname,
            port: copy.target.port,
            method: req.method,
            path: url,
            headers,
            agent: copy.agent,
          });
          let answered = false;
          upstream.setTimeout(timeoutMs, () => {
            upstream.destroy(new Error('timeout'));
          });
          upstream.on('response', (answer) => {
            answered = true;
            copy.served++;
            const outHeaders: http.OutgoingHttpHeaders = {};
            for (const [name, value] of Object.entries(answer.headers)) if (!HOP_BY_HOP.has(name)) outHeaders[name] = value;
            if (memoKey) outHeaders[CALCULATION_HEADER] = 'computed';
            res.writeHead(answer.statusCode ?? 502, outHeaders);
            if (memoKey && answer.statusCode === 200) {
              const chunks: Buffer[] = [];
              answer.on('data', (chunk: Buffer) => chunks.push(chunk));
              answer.on('end', () => memo!.remember(memoKey, answer.headers, Buffer.concat(chunks)));
            }
            answer.pipe(res);
            answer.on('error', () => res.destroy());
          });
          upstream.on('error', (err: NodeJS.ErrnoException) => {
            if (answered || res.destroyed) return res.destroy();
            if (err.message === 'timeout') {
              // Slow is not broken: a long cutting plan is not sent a second time.
              return sendError(res, 504, 'upstream_timeout', `The calculator took longer than ${timeoutMs / 1000} s; try again in a moment.`);
            }
            // A kept-alive connection the copy closed just as it was reused: the copy is fine, ask again.
            const staleSocket = err.code === 'ECONNRESET' && upstream.reusedSocket;
            if (!staleSocket) pool.markDown(copy, err.code ?? err.message);
            if (retried) return sendError(res, 503, 'service_unavailable', 'No calculator is answering just now; try again in a moment.', { 'retry-after': '2' });
            attempt(staleSocket ? pool.pick() : pool.pick(copy), true);
          });
          // A client that hangs up stops the calculation's connection too.
          res.on('close', () => {
            if (!res.writableFinished) upstream.destroy();
          });
          upstream.end(body);
        };
        attempt(pool.pick(), false);
      },
      () => sendError(res, 400, 'invalid_input', 'The request body could not be read.'),
    );
  };
}
