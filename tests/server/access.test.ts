import request from 'supertest';
import { count } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { invitations, musicians, plans } from '@/server/db/schema';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import { databaseChecksum } from './support/db-checksum';
import { listRoutes } from './support/routes';
import { createAccount, createTestContext, signedInAgent, type TestContext } from './support/test-app';

type Caller = 'anonymous' | 'clinician' | 'otherClinician' | 'musician' | 'teacher' | 'admin';

interface Ids {
  ownMusician: string;
  /** Another musician of the same clinician, with an active plan. */
  planned: string;
  /** A private document of ownMusician. */
  privateDoc: string;
  /** Two drafts of ownMusician's plan (one edited and deleted, one activated last), a piece, a setup item. */
  draft: string;
  draftToActivate: string;
  piece: string;
  setupItem: string;
  /** A teacher the musician does not share with. */
  teacher: string;
}

interface Row {
  method: 'get' | 'post' | 'patch' | 'delete';
  path: (ids: Ids) => string;
  body?: (caller: Caller) => object;
  expect: Record<Caller, number>;
}

const invite = (caller: Caller) => ({ role: 'teacher', name: 'New Teacher', email: `teacher.from.${caller}@school.example` });

const clinicianOnly = (ok: number) => ({ anonymous: 401, clinician: ok, otherClinician: 404, musician: 403, teacher: 403, admin: 403 });
const settings = { settings: { startDate: '2027-03-08', event: { name: 'Recital', date: '2027-05-01' } } };

// The clinician's record of one musician: another clinician gets 404, everyone else 403, anonymous 401.
const recordRows: Row[] = [
  { method: 'get', path: () => '/api/plan-presets', expect: { anonymous: 401, clinician: 200, otherClinician: 200, musician: 403, teacher: 403, admin: 403 } },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/profile`, expect: clinicianOnly(200) },
  { method: 'patch', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/profile`, body: () => ({ problem: { region: 'Left forearm' } }), expect: clinicianOnly(200) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/notes`, expect: clinicianOnly(200) },
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/notes`, body: () => ({ body: 'Seen today.' }), expect: clinicianOnly(201) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/check-ins`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ planned }) => `/api/musicians/${planned}/chart`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ planned }) => `/api/musicians/${planned}/load`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/plans`, expect: clinicianOnly(200) },
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/plans`, body: () => settings, expect: clinicianOnly(201) },
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/plans/preview`, body: () => settings, expect: clinicianOnly(200) },
  { method: 'get', path: ({ planned }) => `/api/musicians/${planned}/plan`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ planned }) => `/api/musicians/${planned}/plan/overrides`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ planned }) => `/api/musicians/${planned}/plan/print`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/pieces`, expect: clinicianOnly(200) },
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/pieces`, body: () => ({ title: 'Etude', tier: 'easy' }), expect: clinicianOnly(201) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/setup`, expect: clinicianOnly(200) },
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/setup`, body: () => ({ kind: 'strap', label: 'Neck strap' }), expect: clinicianOnly(201) },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/documents`, expect: clinicianOnly(200) },
  { method: 'get', path: ({ ownMusician, privateDoc }) => `/api/musicians/${ownMusician}/documents/${privateDoc}/file`, expect: clinicianOnly(200) },
  // A musician sees only documents shared with them: a private one is not found.
  { method: 'get', path: () => '/api/documents', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 200, teacher: 403, admin: 403 } },
  { method: 'get', path: ({ privateDoc }) => `/api/documents/${privateDoc}/file`, expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 404, teacher: 403, admin: 403 } },
  { method: 'post', path: () => '/api/summary/send-now', expect: { anonymous: 401, clinician: 200, otherClinician: 200, musician: 403, teacher: 403, admin: 403 } },
];

// Who may call what. 404 for another clinician's musician: their existence is not revealed.
const everyone = (status: number) => ({ anonymous: status, clinician: status, otherClinician: status, musician: status, teacher: status, admin: status });
const musicianOnly = (ok: number) => ({ anonymous: 401, clinician: 403, otherClinician: 403, musician: ok, teacher: 403, admin: 403 });

// Public routes, where a secret in the link is the credential: an unknown one is not found for anyone.
const publicRows: Row[] = [
  { method: 'get', path: () => '/api/health', expect: everyone(200) },
  { method: 'get', path: () => '/api/calendar/feeds/unknown-feed-token-000000.ics', expect: everyone(404) },
  { method: 'get', path: () => '/api/invitations/by-token/unknown-invitation-token-0000', expect: everyone(404) },
  { method: 'post', path: () => '/api/invitations/by-token/unknown-invitation-token-0000/accept', body: () => ({ password: 'correct-horse-battery' }), expect: everyone(404) },
];

// Rows that change what later rows see run last, in this order.
const changingRows: Row[] = [
  { method: 'post', path: () => '/api/calendar/feed', expect: musicianOnly(201) },
  { method: 'get', path: ({ teacher }) => `/api/students/${teacher}/print`, expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 404, admin: 403 } },
  { method: 'get', path: () => '/api/admin/mail/unknown-message', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 403, admin: 404 } },
  { method: 'delete', path: ({ teacher }) => `/api/shares/teachers/${teacher}`, expect: musicianOnly(404) },
  { method: 'delete', path: () => '/api/shares/invitations/nobody%40school.example', expect: musicianOnly(404) },
  { method: 'get', path: ({ ownMusician, draft }) => `/api/musicians/${ownMusician}/plans/${draft}`, expect: clinicianOnly(200) },
  { method: 'patch', path: ({ ownMusician, draft }) => `/api/musicians/${ownMusician}/plans/${draft}`, body: () => settings, expect: clinicianOnly(200) },
  { method: 'post', path: ({ planned }) => `/api/musicians/${planned}/plan/overrides`, body: () => ({ action: 'hold', reason: 'Reviewing grip' }), expect: clinicianOnly(201) },
  { method: 'patch', path: ({ ownMusician, piece }) => `/api/musicians/${ownMusician}/pieces/${piece}`, body: () => ({ title: 'Etude in D' }), expect: clinicianOnly(200) },
  { method: 'patch', path: ({ ownMusician, setupItem }) => `/api/musicians/${ownMusician}/setup/${setupItem}`, body: () => ({ active: false }), expect: clinicianOnly(200) },
  // A JSON body is not an upload: the clinician reaches the upload's own validation, nothing is stored.
  { method: 'post', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/documents`, body: () => ({ title: 'No file' }), expect: clinicianOnly(422) },
  { method: 'patch', path: ({ ownMusician, privateDoc }) => `/api/musicians/${ownMusician}/documents/${privateDoc}`, body: () => ({ visibility: 'private' }), expect: clinicianOnly(200) },
  { method: 'delete', path: ({ ownMusician, draft }) => `/api/musicians/${ownMusician}/plans/${draft}`, expect: clinicianOnly(204) },
  { method: 'delete', path: ({ ownMusician, piece }) => `/api/musicians/${ownMusician}/pieces/${piece}`, expect: clinicianOnly(204) },
  { method: 'delete', path: ({ ownMusician, setupItem }) => `/api/musicians/${ownMusician}/setup/${setupItem}`, expect: clinicianOnly(204) },
  { method: 'delete', path: ({ ownMusician, privateDoc }) => `/api/musicians/${ownMusician}/documents/${privateDoc}`, expect: clinicianOnly(204) },
  { method: 'post', path: ({ ownMusician, draftToActivate }) => `/api/musicians/${ownMusician}/plans/${draftToActivate}/activate`, expect: clinicianOnly(200) },
];

const matrix: Row[] = [
  ...publicRows,
  { method: 'get', path: () => '/api/me', expect: { anonymous: 401, clinician: 200, otherClinician: 200, musician: 200, teacher: 200, admin: 200 } },
  { method: 'get', path: () => '/api/me/musician', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 200, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/musicians', expect: { anonymous: 401, clinician: 200, otherClinician: 200, musician: 403, teacher: 403, admin: 403 } },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}`, expect: { anonymous: 401, clinician: 200, otherClinician: 404, musician: 403, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/invitations', expect: { anonymous: 401, clinician: 200, otherClinician: 200, musician: 403, teacher: 403, admin: 403 } },
  { method: 'post', path: () => '/api/invitations', body: invite, expect: { anonymous: 401, clinician: 201, otherClinician: 201, musician: 403, teacher: 403, admin: 403 } },
  // The musician here has no plan yet: today's programme is a 404 for them, their check-in list is empty.
  { method: 'get', path: () => '/api/today', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 404, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/plan', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 404, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/check-ins', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 200, teacher: 403, admin: 403 } },
  { method: 'post', path: () => '/api/check-ins', body: () => ({ clientKey: 'matrix-check-in', checkIn: { kind: 'next_morning', date: '2027-03-01', pain: 0 } }), expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 404, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/calendar/feed', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 200, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/calendar/download.ics', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 404, teacher: 403, admin: 403 } },
  { method: 'get', path: () => '/api/shares', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 200, teacher: 403, admin: 403 } },
  { method: 'post', path: () => '/api/shares', body: (caller) => ({ name: 'A Teacher', email: `shared.by.${caller}@school.example` }), expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 201, teacher: 403, admin: 403 } },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/shares`, expect: { anonymous: 401, clinician: 200, otherClinician: 404, musician: 403, teacher: 403, admin: 403 } },
  // The teacher here has no share from this musician: not found, as if the student did not exist.
  { method: 'get', path: ({ ownMusician }) => `/api/students/${ownMusician}`, expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 404, admin: 403 } },
  { method: 'get', path: () => '/api/students', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 200, admin: 403 } },
  { method: 'get', path: () => '/api/admin/users', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 403, admin: 200 } },
  { method: 'get', path: () => '/api/admin/audit', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 403, admin: 200 } },
  { method: 'get', path: ({ ownMusician }) => `/api/musicians/${ownMusician}/audit`, expect: clinicianOnly(200) },
  { method: 'get', path: () => '/api/admin/mail', expect: { anonymous: 401, clinician: 403, otherClinician: 403, musician: 403, teacher: 403, admin: 200 } },
  ...recordRows,
  ...changingRows,
];

describe('who may call what', () => {
  let ctx: TestContext;
  let ids: Ids;
  let agents: Record<Caller, ReturnType<typeof request.agent>>;

  beforeAll(async () => {
    ctx = createTestContext({ devMailbox: true });
    const wrenId = await createAccount(ctx, 'clinician', 'wren@clinic.example');
    await createAccount(ctx, 'clinician', 'odile@clinic.example');
    const teacher = await createAccount(ctx, 'teacher', 'ruth@school.example');
    await createAccount(ctx, 'admin', 'admin@ritorno.example');
    const wren = await signedInAgent(ctx, 'wren@clinic.example');
    const invited = await wren
      .post('/api/invitations')
      .send({ role: 'musician', name: 'Pia Lund', email: 'pia@students.example', instrument: 'Viola' });
    const ownMusician: string = invited.body.musicianId;
    const planned = randomUUID();
    ctx.db.insert(musicians).values({ id: planned, clinicianId: wrenId, name: 'Tam Reed', email: 'tam@students.example', instrument: 'Flute', createdAt: ctx.clock.now }).run();
    const active = PlanSettingsSchema.parse({ startDate: '2027-02-22', event: { name: 'Recital', date: '2027-05-01' } });
    ctx.db.insert(plans).values({ id: randomUUID(), musicianId: planned, version: 1, status: 'active', settings: active, createdById: wrenId, createdAt: ctx.clock.now, activatedAt: ctx.clock.now }).run();
    const doc = await wren.post(`/api/musicians/${ownMusician}/documents`).field('title', 'Letter').attach('file', Buffer.from('%PDF-1.4 letter'), 'letter.pdf').expect(201);
    const draft = (await wren.post(`/api/musicians/${ownMusician}/plans`).send(settings).expect(201)).body.id;
    const draftToActivate = (await wren.post(`/api/musicians/${ownMusician}/plans`).send(settings).expect(201)).body.id;
    const piece = (await wren.post(`/api/musicians/${ownMusician}/pieces`).send({ title: 'Etude', tier: 'easy' }).expect(201)).body.id;
    const setupItem = (await wren.post(`/api/musicians/${ownMusician}/setup`).send({ kind: 'strap', label: 'Neck strap' }).expect(201)).body.id;
    ids = { ownMusician, planned, privateDoc: doc.body.id, draft, draftToActivate, piece, setupItem, teacher };
    const token = ctx.outbox[0]?.text.match(/invitation\/(\S+)/)?.[1];
    await request(ctx.app).post(`/api/invitations/by-token/${token}/accept`).send({ password: 'correct-horse-battery' }).expect(201);
    agents = {
      anonymous: request.agent(ctx.app),
      clinician: wren,
      otherClinician: await signedInAgent(ctx, 'odile@clinic.example'),
      musician: await signedInAgent(ctx, 'pia@students.example'),
      teacher: await signedInAgent(ctx, 'ruth@school.example'),
      admin: await signedInAgent(ctx, 'admin@ritorno.example'),
    };
  });

  for (const row of matrix) {
    for (const [caller, status] of Object.entries(row.expect) as [Caller, number][]) {
      it(`answers ${status} to ${caller} for ${row.method.toUpperCase()} ${row.path({ ownMusician: ':id', planned: ':planned', privateDoc: ':doc', draft: ':draft', draftToActivate: ':draft', piece: ':piece', setupItem: ':item', teacher: ':teacher' })}`, async () => {
        const before = databaseChecksum(ctx.db);
        const call = agents[caller][row.method](row.path(ids));
        const response = row.body ? await call.send(row.body(caller)) : await call;
        expect(response.status).toBe(status);
        if (status >= 400) {
          expect(response.body.error.code).toEqual(expect.any(String));
          expect(databaseChecksum(ctx.db)).toBe(before);
        }
      });
    }
  }

  it('has a row for every route the server really serves', () => {
    const toRegex = (pattern: string) => new RegExp(`^${pattern.replace(/[.]/g, '\\.').replace(/:[A-Za-z]+/g, '[^/]+')}$`);
    const concrete = matrix.map((row) => ({ method: row.method.toUpperCase(), path: row.path(ids) }));
    const missing = listRoutes(ctx.app)
      .filter((route) => !concrete.some((row) => row.method === route.method && toRegex(route.path).test(row.path)))
      .map((route) => `${route.method} ${route.path}`);
    expect(missing).toEqual([]);
  });

  it('writes nothing when the input is malformed, and names the fields', async () => {
    const before = ctx.db.select({ n: count() }).from(musicians).get()?.n;
    const response = await agents.clinician.post('/api/invitations').send({ role: 'musician', name: '', email: 'not-an-address' });
    expect(response.status).toBe(422);
    const paths = response.body.error.issues.map((issue: { path: string }) => issue.path).sort();
    expect(paths).toEqual(['email', 'instrument', 'name']);
    expect(ctx.db.select({ n: count() }).from(musicians).get()?.n).toBe(before);
  });
});
