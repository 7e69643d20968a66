import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { openDatabase } from '@/server/db/client';
import { checkIns, session, setupItems, user } from '@/server/db/schema';
import type { CheckIn } from '@/shared/schemas/check-in';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent } from './support/test-app';

// Today's programme and the session lookup are kept between requests (today.service.ts,
// middleware/session-cache.ts). Every change below is written straight to the database, as any future
// code path might, and must show on the next request.
const painful: CheckIn = {
  kind: 'session', date: '2027-03-01', sessionIndex: 0, gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 7 }], redFlags: [], effort: 4, minutesPlayed: 5,
};

async function setup(file?: string) {
  const ctx = createTestContext({ file });
  const pia = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
  const musician = await signedInAgent(ctx, pia.email);
  const today = async () => (await musician.get('/api/today').expect(200)).body;
  return { ctx, pia, musician, today };
}

describe("today's programme cache", () => {
  it('does show a check-in written after today was read', async () => {
    const { ctx, pia, today } = await setup();
    const before = await today();
    expect(before.kind).not.toBe('ended');
    ctx.db.insert(checkIns).values({ id: randomUUID(), musicianId: pia.musicianId, date: painful.date, kind: painful.kind, payload: painful, clientKey: 'k1', recordedAt: ctx.clock.now }).run();
    const after = await today();
    expect(after).not.toEqual(before);
  });

  it('does show a setup reminder added after today was read', async () => {
    const { ctx, pia, today } = await setup();
    expect((await today()).setup).toEqual([]);
    const id = randomUUID();
    ctx.db.insert(setupItems).values({ id, musicianId: pia.musicianId, kind: 'chin_rest', label: 'Chin rest', instructions: 'Use the higher one', createdById: pia.clinicianId, createdAt: ctx.clock.now }).run();
    expect((await today()).setup).toEqual([{ id, label: 'Chin rest', instructions: 'Use the higher one' }]);
  });

  it('does show a setup reminder edited or put away after today was read', async () => {
    const { ctx, pia, today } = await setup();
    const id = randomUUID();
    ctx.db.insert(setupItems).values({ id, musicianId: pia.musicianId, kind: 'chin_rest', label: 'Chin rest', instructions: 'Use the higher one', createdById: pia.clinicianId, createdAt: ctx.clock.now }).run();
    expect((await today()).setup).toHaveLength(1);
    // Text moved from one field to the next still reads as a change.
    ctx.db.update(setupItems).set({ label: 'Chin restU', instructions: 'se the higher one' }).where(eq(setupItems.id, id)).run();
    expect((await today()).setup).toEqual([{ id, label: 'Chin restU', instructions: 'se the higher one' }]);
    ctx.db.update(setupItems).set({ active: false }).where(eq(setupItems.id, id)).run();
    expect((await today()).setup).toEqual([]);
  });

  it('answers a repeated read with 304 Not Modified until something changes', async () => {
    const { ctx, pia, musician } = await setup();
    const first = await musician.get('/api/today').expect(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\/"[0-9a-f]+-[A-Za-z0-9+/]{27}"$/);
    await musician.get('/api/today').set('If-None-Match', etag).expect(304);
    ctx.db.insert(checkIns).values({ id: randomUUID(), musicianId: pia.musicianId, date: painful.date, kind: painful.kind, payload: painful, clientKey: 'k2', recordedAt: ctx.clock.now }).run();
    const changed = await musician.get('/api/today').set('If-None-Match', etag).expect(200);
    expect(changed.headers.etag).not.toBe(etag);
    expect(changed.headers['content-type']).toBe('application/json; charset=utf-8');
  });

  it('does move to the next day when the plan day changes', async () => {
    const { ctx, today } = await setup();
    const date = (await today()).date;
    ctx.clock.now = new Date('2027-03-02T09:00:00Z');
    expect((await today()).date).not.toBe(date);
  });
});

describe('session lookup cache', () => {
  it('does refuse a session deleted after it was used', async () => {
    const { ctx, pia, musician } = await setup();
    await musician.get('/api/me').expect(200);
    ctx.db.delete(session).where(eq(session.userId, pia.userId)).run();
    await musician.get('/api/me').expect(401);
  });

  it('does see a role change and an expiry on the next request', async () => {
    const { ctx, pia, musician } = await setup();
    await musician.get('/api/today').expect(200);
    ctx.db.update(user).set({ role: 'teacher' }).where(eq(user.id, pia.userId)).run();
    await musician.get('/api/today').expect(403);
    ctx.db.update(user).set({ role: 'musician' }).where(eq(user.id, pia.userId)).run();
    await musician.get('/api/today').expect(200);
    ctx.db.update(session).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(session.userId, pia.userId)).run();
    await musician.get('/api/today').expect(401);
  });
});

describe('writes from another process', () => {
  // Another connection stands for a second server process or a maintenance script on the same file.
  it('are seen by the session check and today on the next request', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-generation-'));
    const file = path.join(dir, 'ritorno.db');
    try {
      const { ctx, pia, musician, today } = await setup(file);
      const before = await today();
      const other = openDatabase(file);
      other.insert(checkIns).values({ id: randomUUID(), musicianId: pia.musicianId, date: painful.date, kind: painful.kind, payload: painful, clientKey: 'k3', recordedAt: ctx.clock.now }).run();
      expect(await today()).not.toEqual(before);
      other.delete(session).where(eq(session.userId, pia.userId)).run();
      await musician.get('/api/today').expect(401);
      other.$client.close();
      ctx.db.$client.close();
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
