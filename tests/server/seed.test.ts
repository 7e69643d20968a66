import { seedDemo } from '@/server/db/seed';
import { createTestContext, signedInAgent } from './support/test-app';

describe('demo data', () => {
  it('seeds the invented scenario once: a held musician, one out of reach, and private caseloads', async () => {
    const ctx = createTestContext();
    const now = new Date('2027-03-01T09:00:00Z');
    const seeded = await seedDemo(ctx.db, ctx.auth, now);
    expect(seeded?.accounts.map((a) => a.role).sort()).toEqual(
      ['admin', 'clinician', 'clinician', 'musician', 'musician', 'musician', 'musician', 'teacher', 'teacher'],
    );
    expect(await seedDemo(ctx.db, ctx.auth, now)).toBeNull();

    const clinician = await signedInAgent(ctx, 'maren.oakley@linden-clinic.example', seeded?.password);
    const caseload: { name: string; plan: { status: string; feasible: boolean; daysToEvent: number } | null }[] =
      (await clinician.get('/api/musicians')).body;
    const byName = new Map(caseload.map((entry) => [entry.name, entry.plan]));
    expect([...byName.keys()]).toEqual(['Caio Brandt', 'Ilse Varga', 'Noor Haddad']);
    expect(byName.get('Caio Brandt')?.status).toBe('held');
    expect(byName.get('Ilse Varga')).toMatchObject({ status: 'on_track', feasible: true });
    expect(byName.get('Noor Haddad')).toMatchObject({ feasible: false });
    expect(byName.get('Ilse Varga')?.daysToEvent).toBe(52);

    const caio = (caseload as unknown as { id: string; name: string }[]).find((entry) => entry.name === 'Caio Brandt');
    const setup: { label: string; active: boolean }[] = (await clinician.get(`/api/musicians/${caio?.id}/setup`)).body;
    expect(setup.map((item) => item.label).sort()).toEqual(['Neck strap on every session', 'Thumb rest raised one notch']);
    expect((await clinician.get(`/api/musicians/${caio?.id}/notes`)).body).toHaveLength(1);

    const musician = await signedInAgent(ctx, 'caio.brandt@harbourside.example', seeded?.password);
    const home = (await musician.get('/api/me/musician')).body;
    // Seeded on Monday 1 Mar 2027, the demo's rest day is the Thursday after, so the latest session was on Sunday.
    expect(home.plan.lastChange).toMatch(/^Held at stage \d+ on 28 Feb 2027: pain 3 after block 2\.$/);
  });
});
