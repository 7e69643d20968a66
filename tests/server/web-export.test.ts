import crypto from 'node:crypto';
import request from 'supertest';
import { createTestContext, createAccount } from './support/test-app';
import { musicianWithPlan } from './support/plan-fixture';
import { appServing, fakeWebExport, readsIn, sessionCookie } from './support/web-export-fixture';

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
const preload = '<link rel="preload" as="script" href="/_expo/static/js/web/signed-in-screens-def456.js" />';

describe('the web export: files', () => {
  it('does cache hashed scripts and fonts for a year, and the favicon for an hour', async () => {
    const app = appServing(fakeWebExport());
    for (const url of ['/_expo/static/js/web/entry-abc123.js', '/assets/assets/fonts/Figtree.abc123.ttf']) {
      const response = await request(app).get(url);
      expect([url, response.status, response.headers['cache-control']]).toEqual([url, 200, 'public, max-age=31536000, immutable']);
    }
    expect((await request(app).get('/favicon.ico')).headers['cache-control']).toBe('public, max-age=3600');
  });

  it('does compress the script when the browser accepts gzip, and not otherwise', async () => {
    const app = appServing(fakeWebExport());
    const url = '/_expo/static/js/web/entry-abc123.js';
    const gzipped = await request(app).get(url).set('Accept-Encoding', 'gzip');
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.text).toContain('console.log');
    const plain = await request(app).get(url).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
  });

  it('does refuse to start on an export that is not server-rendered, saying what to set', () => {
    expect(() => appServing(fakeWebExport({ rendering: 'none' }))).toThrow(/web\.output "server"/);
  });
});

describe('the web export: pages drawn on request', () => {
  it('does draw each route, dynamic segments included, and never lets a cache keep it', async () => {
    const app = appServing(fakeWebExport());
    for (const url of ['/', '/sign-in', '/home', '/musicians/m-42', '/musicians/m-42/plan/new', '/mailbox']) {
      const response = await request(app).get(url);
      expect([url, response.status]).toEqual([url, 200]);
      expect(response.text).toContain(`<main>drawn ${url}</main>`);
      expect(response.text).toContain('<script src="/_expo/static/js/web/entry-abc123.js" defer></script>');
      expect(response.headers['cache-control']).toBe('private, no-store');
      expect(response.headers.vary).toMatch(/Cookie/);
    }
  });

  it('does answer an unknown path with the not-found screen and a 404', async () => {
    const app = appServing(fakeWebExport());
    for (const url of ['/nowhere', '/musicians/m-42/plan', '/caseload/some-id']) {
      const response = await request(app).get(url);
      expect([url, response.status]).toEqual([url, 404]);
      expect(response.text).toContain(`<main>drawn ${url}</main>`);
    }
  });

  it('does draw a page again, waiting for every part, when the first drawing left a part for the browser', async () => {
    const webDir = fakeWebExport({ unfinishedFirst: true });
    const app = appServing(webDir);
    const first = await request(app).get('/home');
    expect(first.text).toContain('<main>drawn /home</main>');
    expect(first.text).not.toContain('<!--$!-->');
    await request(app).get('/plan');
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- the stand-in renderer the server loaded.
    const renderer = require(`${webDir}/server/_expo/server/render.js`) as { calls: string[] };
    expect(renderer.calls).toEqual(['static /home', 'streamed /home', 'static /home', 'static /plan']);
  });

  it('does preload the signed-in screens for a signed-in visitor only, and never asks the app to hydrate', async () => {
    const base = createTestContext();
    await createAccount(base, 'clinician', 'ines.marlow@clinic.example');
    const cookie = await sessionCookie(base, 'ines.marlow@clinic.example');
    const app = appServing(fakeWebExport(), base);
    const signedIn = await request(app).get('/musicians/m-42').set('Cookie', cookie);
    expect(signedIn.text).toMatch(new RegExp(`${escape(preload)}</head>`));
    expect(signedIn.text).not.toContain('__EXPO_ROUTER_HYDRATE__');
    for (const cookieOrNone of ['better-auth.session_token=gone.gone', undefined]) {
      const call = request(app).get('/musicians/m-42');
      const signedOut = cookieOrNone ? await call.set('Cookie', cookieOrNone) : await call;
      expect(signedOut.text).not.toContain('rel="preload"');
      expect(signedOut.text).not.toContain('__EXPO_ROUTER_HYDRATE__');
      expect(readsIn(signedOut.text)).toBeUndefined();
    }
  });

  it('does draw only the signed-in screens without the chunk preload when the export has no such chunk', async () => {
    const base = createTestContext();
    await createAccount(base, 'clinician', 'ines.marlow@clinic.example');
    const cookie = await sessionCookie(base, 'ines.marlow@clinic.example');
    const response = await request(appServing(fakeWebExport({ signedInChunk: false }), base)).get('/musicians/m-42').set('Cookie', cookie);
    expect(response.status).toBe(200);
    expect(response.text).not.toContain('as="script"');
  });

  it('does send someone signed in home from the signed-out screens before any page is drawn, and nobody else', async () => {
    const base = createTestContext();
    await createAccount(base, 'musician', 'hana.okoro@example.test');
    const cookie = await sessionCookie(base, 'hana.okoro@example.test');
    const app = appServing(fakeWebExport(), base);
    for (const url of ['/sign-in', '/sign-up', '/forgot-password']) {
      const response = await request(app).get(url).set('Cookie', cookie);
      expect([url, response.status, response.headers.location]).toEqual([url, 302, '/']);
      expect(response.headers['cache-control']).toBe('no-store');
    }
    expect((await request(app).get('/home').set('Cookie', cookie)).status).toBe(200);
    for (const other of ['better-auth.session_token=gone.gone', undefined]) {
      const call = request(app).get('/sign-in');
      const response = other ? await call.set('Cookie', other) : await call;
      expect([response.status, response.text]).toEqual([200, expect.stringContaining('<main>drawn /sign-in</main>')]);
    }
  });

  it('does allow exactly the inline scripts of each answer by hash in the Content-Security-Policy', async () => {
    const base = createTestContext();
    await musicianWithPlan(base, { startDate: '2027-02-22' });
    const cookie = await sessionCookie(base, 'pia@students.example');
    const app = appServing(fakeWebExport(), base);
    const hashOf = (script: string) => `'sha256-${crypto.createHash('sha256').update(script).digest('base64')}'`;
    const scriptSrc = (policy: unknown) => String(policy).split(';').find((directive) => directive.startsWith('script-src'));
    // A signed-out page carries no inline script: the policy stays as it is.
    const signedOut = await request(app).get('/sign-in');
    expect(scriptSrc(signedOut.headers['content-security-policy'])).toBe("script-src 'self'");
    const today = await request(app).get('/home').set('Cookie', cookie);
    const dataScript = /<script id="expo-router-data">([\s\S]*?)<\/script>/.exec(today.text)?.[1] ?? '';
    expect(dataScript).toContain('__EXPO_ROUTER_LOADER_DATA__');
    expect(scriptSrc(today.headers['content-security-policy'])).toBe(`script-src 'self' ${hashOf(dataScript)}`);
    expect(String((await request(app).get('/api/health')).headers['content-security-policy'])).toContain("script-src 'self';");
  });
});

describe("the web export: a page carries its first reads, as the API answers them, for its visitor only", () => {
  it("does carry the account, the day and the musician's summary on a musician's Today", async () => {
    const base = createTestContext();
    await musicianWithPlan(base, { startDate: '2027-02-22' });
    const cookie = await sessionCookie(base, 'pia@students.example');
    const app = appServing(fakeWebExport(), base);
    const reads = readsIn((await request(app).get('/home').set('Cookie', cookie)).text);
    const api = async (path: string) => (await request(app).get(path).set('Cookie', cookie)).body as unknown;
    expect(reads).toEqual({ '/api/me': await api('/api/me'), '/api/today': await api('/api/today'), '/api/me/musician': await api('/api/me/musician') });
    // Another page of theirs carries the account alone.
    expect(readsIn((await request(app).get('/plan').set('Cookie', cookie)).text)).toEqual({ '/api/me': await api('/api/me') });
  });

  it('does carry only the account for another role on the same page', async () => {
    const base = createTestContext();
    await createAccount(base, 'teacher', 'tomas.reyes@school.example', 'Tomas Reyes');
    const cookie = await sessionCookie(base, 'tomas.reyes@school.example');
    const reads = readsIn((await request(appServing(fakeWebExport(), base)).get('/home').set('Cookie', cookie)).text);
    expect(reads).toEqual({ '/api/me': { id: expect.any(String), name: 'Tomas Reyes', email: 'tomas.reyes@school.example', role: 'teacher' } });
  });

  it('does leave out a read the API answers with an error, for the app to ask and show', async () => {
    const base = createTestContext();
    // A musician account with no musician record or plan: the API answers the day with 404.
    await createAccount(base, 'musician', 'noor.haddad@example.test');
    const cookie = await sessionCookie(base, 'noor.haddad@example.test');
    const app = appServing(fakeWebExport(), base);
    expect((await request(app).get('/api/today').set('Cookie', cookie)).status).toBe(404);
    const page = await request(app).get('/home').set('Cookie', cookie);
    expect(page.status).toBe(200);
    expect(Object.keys(readsIn(page.text) ?? {})).toEqual(['/api/me']);
  });
});
