import type { z } from 'zod';

/** One public route as the OpenAPI document describes it; the contract tests compare it with the services. */
export interface RouteDoc {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  /** Express-style path, e.g. /api/v1/animals/:id */
  path: string;
  tag: string;
  summary: string;
  description?: string;
  /** Roles that may call it; empty for public routes. `integrator` means an API key. */
  roles: string[];
  params?: z.ZodObject;
  query?: z.ZodObject;
  body?: z.ZodType;
  bodyExample?: unknown;
  /** Success status and schema; undefined schema means an empty body. */
  success: { status: number; schema?: z.ZodType; description: string };
  /** Error statuses this route can answer beyond 400/401/403. */
  errors?: number[];
}

export const routes: RouteDoc[] = [];

export function documentRoutes(...docs: RouteDoc[]): void {
  routes.push(...docs);
}
