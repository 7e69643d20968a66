import { randomUUID } from 'node:crypto';
import { count } from 'drizzle-orm';
import type { Role } from '../../shared/schemas/role';
import type { Auth } from '../auth';
import type { Db } from './client';
import { PieceSchema } from '../../shared/schemas/piece';
import { PlanSettingsSchema } from '../../shared/schemas/plan-settings';
import { demoHistory } from './demo-history';
import { checkIns, clearanceShares, clinicalNotes, musicians, pieces, plans, setupItems, user } from './schema';
import { DEMO_PASSWORD, demoScenario } from './demo-scenario';

export interface SeededAccount {
  role: Role;
  name: string;
  email: string;
}

/** Seeds the invented demo scenario into an empty database; does nothing otherwise. */
export async function seedDemo(db: Db, auth: Auth, now: Date): Promise<{ password: string; accounts: SeededAccount[] } | null> {
  const users = db.select({ n: count() }).from(user).get();
  if ((users?.n ?? 0) > 0) return null;

  const scenario = demoScenario(now);
  const ids = new Map<string, string>();
  const accounts: SeededAccount[] = [];
  for (const person of scenario.people) {
    const created = await auth.api.createUser({
      body: { email: person.email, password: DEMO_PASSWORD, name: person.name, role: person.role },
    });
    ids.set(person.key, created.user.id);
    accounts.push({ role: person.role, name: person.name, email: person.email });
  }
  const idOf = (key: string) => {
    const id = ids.get(key);
    if (!id) throw new Error(`Demo scenario names an unknown person: ${key}`);
    return id;
  };

  db.transaction((tx) => {
    for (const entry of scenario.musicians) {
      const musicianId = randomUUID();
      const person = scenario.people.find((p) => p.key === entry.person);
      tx.insert(musicians)
        .values({
          id: musicianId,
          clinicianId: idOf(entry.clinician),
          userId: idOf(entry.person),
          name: person?.name ?? entry.person,
          email: person?.email ?? '',
          instrument: entry.instrument,
          problemRegion: entry.problem?.region,
          problemSide: entry.problem?.side,
          problemOnset: entry.problem?.onset,
          createdAt: now,
        })
        .run();
      if (entry.plan) {
        const settings = PlanSettingsSchema.parse(entry.plan.settings);
        const clinicianId = idOf(entry.clinician);
        tx.insert(plans)
          .values({ id: randomUUID(), musicianId, version: 1, status: 'active', settings, createdById: clinicianId, createdAt: now, activatedAt: now })
          .run();
        for (const checkIn of demoHistory(settings, scenario.today, entry.plan.painDays)) {
          tx.insert(checkIns)
            .values({
              id: randomUUID(),
              musicianId,
              date: checkIn.date,
              kind: checkIn.kind,
              payload: checkIn,
              clientKey: randomUUID(),
              recordedAt: checkIn.recordedAt ? new Date(checkIn.recordedAt) : now,
            })
            .run();
        }
      }
      for (const input of entry.pieces) {
        const piece = PieceSchema.parse(input);
        tx.insert(pieces)
          .values({ id: randomUUID(), musicianId, title: piece.title, composer: piece.composer, tier: piece.tier, passages: piece.passages, onProgramme: piece.onProgramme, createdAt: now })
          .run();
      }
      for (const item of entry.setup ?? []) {
        tx.insert(setupItems).values({ id: randomUUID(), musicianId, ...item, createdById: idOf(entry.clinician), createdAt: now }).run();
      }
      for (const body of entry.notes ?? []) {
        tx.insert(clinicalNotes).values({ id: randomUUID(), musicianId, authorId: idOf(entry.clinician), body, createdAt: now }).run();
      }
      for (const teacher of entry.sharedWith) {
        tx.insert(clearanceShares).values({ id: randomUUID(), musicianId, teacherId: idOf(teacher), createdAt: now }).run();
      }
    }
  });
  return { password: DEMO_PASSWORD, accounts };
}
