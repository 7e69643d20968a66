import { randomUUID } from 'node:crypto';
import type { Db } from '../db/client';
import { auditEvents } from '../db/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Records who did what to whose record and when (plan versions, overrides, notes, documents). */
export function audit(
  db: Db | Tx,
  input: { actorId: string; action: string; musicianId: string; detail?: Record<string, unknown>; at: Date },
): void {
  db.insert(auditEvents)
    .values({ id: randomUUID(), actorId: input.actorId, action: input.action, musicianId: input.musicianId, detail: input.detail ?? {}, at: input.at })
    .run();
}
