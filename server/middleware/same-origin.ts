import type { RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses cookie-authenticated writes sent from another site. Session cookies are SameSite=Lax already;
 * this also checks the browser's own statements (Origin, Sec-Fetch-Site), so a form on another site
 * cannot post to the API even where Lax would let it through. Clients without these headers (curl,
 * tests, native apps with a bearer token) are not browsers and are not affected.
 */
export function sameOriginWrites(trustedOrigins: string[]): RequestHandler {
  const trusted = new Set(trustedOrigins.map((origin) => new URL(origin).origin));
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get('origin');
    const site = req.get('sec-fetch-site');
    if (site === 'cross-site' || (origin && origin !== 'null' && !trusted.has(origin))) {
      throw new HttpError(403, 'cross_site', 'Requests from other sites are not accepted.');
    }
    if (origin === 'null') throw new HttpError(403, 'cross_site', 'Requests from other sites are not accepted.');
    next();
  };
}
