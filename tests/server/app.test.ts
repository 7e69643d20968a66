import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { memoryStorage } from '@/server/lib/storage';
import { musicianWithPlan } from './support/plan-fixture';
import { createTestContext, signedInAgent } from './support/test-app';

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
    const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-web-'));
    fs.writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><title>Ritorno</title>');
    const base = createTestContext();
    const app = createApp({ db: base.db, auth: base.auth, mailer: { send: async () => undefined }, env: { PUBLIC_URL: 'http://x', NODE_ENV: 'test' }, now: () => new Date(), storage: memoryStorage(), webDir });
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

  it('serves the exported web app, and index.html for deep links', async () => {
    const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-web-'));
    fs.writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><title>Ritorno</title>');
    fs.writeFileSync(path.join(webDir, 'app.js'), 'console.log(1)');
    const base = createTestContext();
    const app = createApp({ db: base.db, auth: base.auth, mailer: { send: async () => undefined }, env: { PUBLIC_URL: 'http://x', NODE_ENV: 'test' }, now: () => new Date(), storage: memoryStorage(), webDir });
    expect((await request(app).get('/app.js')).text).toBe('console.log(1)');
    const deep = await request(app).get('/caseload/some-id');
    expect(deep.status).toBe(200);
    expect(deep.text).toContain('<title>Ritorno</title>');
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
