import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { ApiErrorBody } from '../../shared/schemas/api-error';

/**
 * Slows password guessing: at most `perMinute` sign-in attempts a minute from one address. Keyed by the
 * socket address Express sees (better-auth's own limiter only sees forwarded headers).
 */
export function signInLimit(perMinute: number): RequestHandler {
  const body: ApiErrorBody = { error: { code: 'too_many_attempts', message: 'Too many sign-in attempts. Wait a minute and try again.' } };
  return rateLimit({
    windowMs: 60_000,
    limit: perMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: body,
  });
}
