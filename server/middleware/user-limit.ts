import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { ApiErrorBody } from '../../shared/schemas/api-error';

/**
 * At most `limit` calls in `windowMs` per signed-in account, for actions that send e-mail on demand: a
 * stuck button or a script cannot flood an inbox. Use after requireSession (keys on the account id).
 */
export function perAccountLimit(options: { limit: number; windowMs: number; message: string }): RequestHandler {
  const body: ApiErrorBody = { error: { code: 'too_many_requests', message: options.message } };
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (_req, res) => res.locals.me?.id ?? 'signed-out',
    message: body,
  });
}
