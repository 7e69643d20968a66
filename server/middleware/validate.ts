import type { RequestHandler } from 'express';
import type { z } from 'zod';

/** Parses req.body with a shared schema and replaces it with the parsed value; a ZodError becomes 422. */
export function validateBody(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    req.body = schema.parse(req.body ?? {});
    next();
  };
}

/** Express 5 exposes req.params per route; parse them so a handler never sees unchecked input. */
export function parseParams<S extends z.ZodType>(schema: S, params: unknown): z.infer<S> {
  return schema.parse(params);
}
