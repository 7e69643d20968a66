import fc from 'fast-check';
import request from 'supertest';
import { musicianWithPlan } from './support/plan-fixture';
import { databaseChecksum } from './support/db-checksum';
import { listRoutes } from './support/routes';
import { createAccount, createTestContext, signedInAgent, type TestContext } from './support/test-app';

jest.setTimeout(120_000);

const SCRIPT = '<script>alert(1)</script>';
const SQL = "'; drop table musicians; --";

/** Bodies a careless or hostile client might send: wrong types, huge or odd strings, deep nesting, pollution keys. */
const hostileValue = fc.oneof(
  fc.constantFrom(SCRIPT, SQL, '\u0000', '𝄞🎻'.repeat(50), 'x'.repeat(90_000), '__proto__', '../../etc/passwd', -1, 1e308, NaN, true, null),
  fc.string({ maxLength: 200 }),
  fc.integer(),
  fc.array(fc.string(), { maxLength: 5 }),
);
const hostileBody = fc.oneof(
  fc.anything({ maxDepth: 3, withObjectString: true, withNullPrototype: true }),
  fc.dictionary(fc.constantFrom('name', 'email', 'title', 'settings', 'checkIn', 'clientKey', 'body', 'tier', 'kind', 'action', 'reason', 'role', 'password'), hostileValue),
  fc.constant(JSON.parse('{"__proto__": {"admin": true}, "constructor": {"prototype": {"role": "admin"}}}')),
  fc.integer({ min: 1, max: 60 }).map((depth) => {
    let nested: unknown = 'bottom';
    for (let i = 0; i < depth * 50; i += 1) nested = { settings: nested };
    return nested;
  }),
);

describe('hostile input', () => {
  let ctx: TestContext;
  let agents: Record<string, ReturnType<typeof request.agent>>;
  let musicianId: string;

  beforeAll(async () => {
    ctx = createTestContext();
    const fixture = await musicianWithPlan(ctx, { startDate: '2027-02-22' });
    musicianId = fixture.musicianId;
    await createAccount(ctx, 'teacher', 'ruth@school.example');
    await createAccount(ctx, 'admin', 'admin@ritorno.example');
    agents = {
      clinician: await signedInAgent(ctx, fixture.clinicianEmail),
      musician: await signedInAgent(ctx, fixture.email),
      teacher: await signedInAgent(ctx, 'ruth@school.example'),
      admin: await signedInAgent(ctx, 'admin@ritorno.example'),
    };
  });

  const concrete = (path: string) => path.replace(/:(id|musicianId)\b/g, musicianId).replace(/:[A-Za-z]+/g, 'not-a-real-id-0000000000');

  it('answers every malformed body on every write route with a 4xx JSON error and writes nothing', async () => {
    const writes = listRoutes(ctx.app).filter((route) => ['POST', 'PUT', 'PATCH'].includes(route.method));
    expect(writes.length).toBeGreaterThan(10);
    let tried = 0;
    for (const route of writes) {
      const path = concrete(route.path);
      // Find who reaches validation on this route: the caller whose empty body gets a 422.
      let caller: string | undefined;
      for (const [name, agent] of Object.entries(agents)) {
        const probe = await agent[route.method.toLowerCase() as 'post'](path).send({});
        if (probe.status === 422) caller = name;
      }
      if (!caller) continue;
      const agent = agents[caller];
      if (!agent) continue;
      await fc.assert(
        fc.asyncProperty(hostileBody, async (body) => {
          const before = databaseChecksum(ctx.db);
          const response = await agent[route.method.toLowerCase() as 'post'](path).set('content-type', 'application/json').send(JSON.stringify(body) ?? 'null');
          tried += 1;
          if (response.status >= 200 && response.status < 300) return; // a hostile value that happens to be valid
          expect(response.status).toBeGreaterThanOrEqual(400);
          expect(response.status).toBeLessThan(500);
          expect(typeof response.body.error?.message).toBe('string');
          expect(databaseChecksum(ctx.db)).toBe(before);
        }),
        { numRuns: 25, seed: 20271201 },
      );
    }
    expect(tried).toBeGreaterThan(200);
  });

  it('answers hostile path parameters and query strings without a 5xx', async () => {
    const reads = listRoutes(ctx.app).filter((route) => route.method === 'GET' && route.path.includes(':'));
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...reads), hostileValue, fc.string({ maxLength: 50 }), async (route, value, query) => {
        const param = encodeURIComponent(String(value)).slice(0, 2000) || 'x';
        const path = route.path.replace(/:[A-Za-z]+/g, param);
        for (const agent of Object.values(agents)) {
          const response = await agent.get(`${path}?sort=${encodeURIComponent(query)}&status=${param}`);
          expect(response.status).toBeLessThan(500);
        }
      }),
      { numRuns: 60, seed: 20271202 },
    );
  });

  it('refuses a body over the size limit with 413 and a JSON error', async () => {
    const agent = agents.musician;
    if (!agent) throw new Error('no musician agent');
    const response = await agent.post('/api/check-ins').set('content-type', 'application/json').send(JSON.stringify({ clientKey: 'x'.repeat(200_000) }));
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('too_large');
  });
});
