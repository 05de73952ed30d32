import type { NextFunction, Request, Response } from 'express';

/** Express 5 forwards rejected promises itself; this only types a handler that returns JSON. */
export function json<T>(handler: (req: Request, res: Response) => Promise<T> | T) {
  return async (req: Request, res: Response, next: NextFunction) => {
    try {
      const body = await handler(req, res);
      if (!res.headersSent) res.json(body);
    } catch (err) {
      next(err);
    }
  };
}
