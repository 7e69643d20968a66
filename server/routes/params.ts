import type { Request } from 'express';
import { z } from 'zod';

const Id = z.string().min(1).max(100);

/** Route parameters, parsed so a handler never sees unchecked input (a bad one is a 422). */
export function paramsOf<K extends string>(req: Request, ...names: K[]): Record<K, string> {
  return z.object(Object.fromEntries(names.map((name) => [name, Id])) as Record<K, typeof Id>).parse(req.params) as Record<K, string>;
}
