import { z } from 'zod';

export const ServiceHealth = z.object({ status: z.enum(['ok', 'down']), latencyMs: z.number().optional(), error: z.string().optional() });
export const HealthResponse = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  services: z.record(z.string(), ServiceHealth),
});
