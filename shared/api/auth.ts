import { z } from 'zod';
import { RoleSchema } from './common.js';

export const LoginRequest = z
  .object({
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200),
    password: z.string().min(1, 'is required').max(200),
  })
  .strict();

export const RefreshRequest = z.object({ refreshToken: z.string().min(1, 'is required').max(4000) }).strict();

export const SessionUser = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
});

export const SessionResponse = z.object({
  accessToken: z.string().describe('JWT; send as `Authorization: Bearer …`.'),
  expiresIn: z.number().int().describe('Seconds until the access token expires.'),
  refreshToken: z.string().describe('Exchange at /api/v1/auth/refresh for a new session before it expires.'),
  user: SessionUser,
});

export const MeResponse = z.object({ user: SessionUser });

/** Internal: the records service checks a password for the gateway. */
export const CredentialsCheckResponse = z.object({ user: SessionUser.extend({ active: z.boolean() }) });

export const LogoutRequest = z
  .object({ refreshToken: z.string().min(1, 'is required').max(4000).optional().describe('Also ends this refresh token when given.') })
  .strict();

export const PasswordResetRequest = z.object({ email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200) }).strict();

export const PasswordResetConfirm = z
  .object({
    token: z.string().min(20, 'is not a reset token').max(200),
    password: z.string().min(10, 'must be at least 10 characters').max(200),
  })
  .strict();

export const AcceptedResponse = z.object({ accepted: z.literal(true), message: z.string() });

/** Internal: a checked sign-in with the server-side session it opened. */
export const InternalSessionRequest = z.object({ sessionId: z.string().min(10).max(100) }).strict();
export const InternalPasswordResetRequest = PasswordResetRequest.extend({ link: z.string().url().max(500) }).strict();
