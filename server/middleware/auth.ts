import type { RequestHandler } from 'express';
import { RoleSchema, type Me, type Role } from '../../shared/schemas/role';
import type { Auth } from '../auth';
import { HttpError } from '../lib/http-error';
import { readSession } from './session-cache';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      me?: Me;
    }
  }
}

type Session = NonNullable<Awaited<ReturnType<typeof readSession>>>;

/** The account a session belongs to, or null when it has no role yet. */
export function accountOf(session: Session): Me | null {
  const role = RoleSchema.safeParse(session.user.role);
  return role.success ? { id: session.user.id, name: session.user.name, email: session.user.email, role: role.data } : null;
}

/** Loads the session from cookie or bearer token; 401 without one. */
export function requireSession(auth: Auth): RequestHandler {
  return async (req, res, next) => {
    const session = await readSession(auth, req.headers);
    if (!session) throw new HttpError(401, 'unauthenticated', 'Sign in to continue.');
    const me = accountOf(session);
    if (!me) throw new HttpError(403, 'forbidden', 'This account has no role yet.');
    res.locals.me = me;
    next();
  };
}

/** 403 unless the signed-in account has one of the roles. Use after requireSession. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    if (!res.locals.me || !roles.includes(res.locals.me.role)) {
      throw new HttpError(403, 'forbidden', 'Your role cannot do this.');
    }
    next();
  };
}

export function currentUser(locals: Express.Locals): Me {
  if (!locals.me) throw new HttpError(401, 'unauthenticated', 'Sign in to continue.');
  return locals.me;
}
