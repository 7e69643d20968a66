import { Router } from 'express';
import { asc } from 'drizzle-orm';
import { z } from 'zod';
import { RoleSchema } from '../../shared/schemas/role';
import type { UserSummary } from '../../shared/schemas/user';
import { user } from '../db/schema';
import { notFound } from '../lib/http-error';
import { requireRole, requireSession } from '../middleware/auth';
import { fullTrail } from '../services/audit-trail.service';
import type { AppDeps } from './deps';

const IdParams = z.object({ id: z.string().min(1).max(100) });

export function adminRoutes({ auth, db, devMailbox }: AppDeps): Router {
  const router = Router();
  router.use(requireSession(auth), requireRole('admin'));

  router.get('/users', (_req, res) => {
    const rows = db.select().from(user).orderBy(asc(user.role), asc(user.name)).all();
    const users: UserSummary[] = rows.map((row) => ({
      id: row.id,
      name: row.name,
      email: row.email,
      role: RoleSchema.parse(row.role),
      createdAt: row.createdAt.toISOString(),
    }));
    res.json(users);
  });

  router.get('/audit', (_req, res) => {
    res.json(fullTrail(db));
  });

  // The development mailbox exists only while the local fake SMTP server is in use.
  router.get('/mail', (_req, res) => {
    if (!devMailbox) throw notFound('Development mailbox');
    res.json(devMailbox());
  });

  router.get('/mail/:id', (req, res) => {
    if (!devMailbox) throw notFound('Development mailbox');
    const { id } = IdParams.parse(req.params);
    const message = devMailbox().find((mail) => mail.id === id);
    if (!message) throw notFound('Message');
    res.json(message);
  });

  return router;
}
