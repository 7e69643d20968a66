import request from 'supertest';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent } from './support/test-app';
import { appServing, fakeWebExport } from './support/web-export-fixture';

describe('the server shell', () => {
  it('answers unknown API routes with a JSON 404', async () => {
    const { app } = createTestContext();
    const response = await request(app).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body).toEqual({ error: { code: 'not_found', message: 'No API route GET /api/no-such-thing.' } });
  });

  it('answers a body that is not JSON with 400, not 500', async () => {
    const { app } = createTestContext();
    const response = await request(app).post('/api/invitations/by-token/aaaaaaaaaaaaaaaaaaaa/accept').set('content-type', 'application/json').send('{"password":');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('malformed_json');
  });

  it('answers an address with a broken %-escape with 400, not 500, on pages and signed-in API routes', async () => {
    const base = createTestContext();
    const app = appServing(fakeWebExport(), base);
    const pia = await musicianWithPlan(base, { startDate: '2027-02-22' });
    const clinician = await signedInAgent(base, pia.clinicianEmail);
    for (const response of [await request(app).get('/musicians/%E0%A4%A'), await clinician.get('/api/musicians/%E0%A4%A')]) {
      expect(response.status).toBe(400);
      expect(response.body.error.code).toBe('malformed_url');
    }
  });

  it('sends security headers', async () => {
    const { app } = createTestContext();
    const response = await request(app).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('serves the exported web app, each screen drawn for a deep link, and the API beside it', async () => {
    const app = appServing(fakeWebExport());
    expect((await request(app).get('/_expo/static/js/web/entry-abc123.js')).text).toContain('console.log');
    const deep = await request(app).get('/musicians/some-id');
    expect(deep.status).toBe(200);
    expect(deep.text).toContain('<title>page /musicians/some-id</title>');
    expect((await request(app).get('/api/nope')).status).toBe(404);
  });
});

describe('cross-site requests', () => {
  it('refuses a cookie-authenticated write from another site and writes nothing', async () => {
    const { createAccount, signedInAgent } = await import('./support/test-app');
    const { databaseChecksum } = await import('./support/db-checksum');
    const ctx = createTestContext();
    await createAccount(ctx, 'clinician', 'wren@clinic.example');
    const clinician = await signedInAgent(ctx, 'wren@clinic.example');
    const invite = { role: 'teacher', name: 'Ruth Calder', email: 'ruth@school.example' };
    const before = databaseChecksum(ctx.db);
    const forged = await clinician.post('/api/invitations').set('origin', 'https://elsewhere.example').send(invite);
    expect(forged.status).toBe(403);
    expect(forged.body.error.code).toBe('cross_site');
    const fetchMeta = await clinician.post('/api/invitations').set('sec-fetch-site', 'cross-site').send(invite);
    expect(fetchMeta.status).toBe(403);
    expect(databaseChecksum(ctx.db)).toBe(before);
    const own = await clinician.post('/api/invitations').set('origin', 'http://ritorno.test').set('sec-fetch-site', 'same-origin').send(invite);
    expect(own.status).toBe(201);
  });
});
