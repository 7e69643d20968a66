import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { memoryStorage } from '@/server/lib/storage';
import { createAccount, createTestContext, PASSWORD } from './support/test-app';

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

const INDEX = '<!doctype html><html><head><title>Ritorno</title></head><body><script src="/_expo/static/js/web/entry-abc123.js" defer></script></body></html>';

function appWithExport({ signedInChunk = true } = {}) {
  const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-web-'));
  fs.writeFileSync(path.join(webDir, 'index.html'), INDEX);
  fs.writeFileSync(path.join(webDir, 'favicon.ico'), 'icon');
  fs.mkdirSync(path.join(webDir, '_expo/static/js/web'), { recursive: true });
  fs.writeFileSync(path.join(webDir, '_expo/static/js/web/entry-abc123.js'), `console.log("${'x'.repeat(4000)}")`);
  if (signedInChunk) fs.writeFileSync(path.join(webDir, '_expo/static/js/web/signed-in-screens-def456.js'), 'chunk');
  fs.mkdirSync(path.join(webDir, 'assets/assets/fonts'), { recursive: true });
  fs.writeFileSync(path.join(webDir, 'assets/assets/fonts/Figtree.abc123.ttf'), 'font');
  const base = createTestContext();
  return createApp({ db: base.db, auth: base.auth, mailer: { send: async () => undefined }, env: { PUBLIC_URL: 'http://x', NODE_ENV: 'test' }, now: () => new Date(), storage: memoryStorage(), webDir });
}

describe('the web export', () => {
  it('does cache hashed scripts and fonts for a year when they are requested', async () => {
    const app = appWithExport();
    for (const url of ['/_expo/static/js/web/entry-abc123.js', '/assets/assets/fonts/Figtree.abc123.ttf']) {
      const response = await request(app).get(url);
      expect(response.status).toBe(200);
      expect(response.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    }
  });

  it('does make browsers revalidate index.html when it is reached directly or by a deep link', async () => {
    const app = appWithExport();
    for (const url of ['/index.html', '/plan/42', '/']) {
      const response = await request(app).get(url);
      expect(response.status).toBe(200);
      expect(response.text).toContain('<title>Ritorno</title>');
      expect(response.headers['cache-control']).toBe('no-cache');
    }
    expect((await request(app).get('/favicon.ico')).headers['cache-control']).toBe('public, max-age=3600');
  });

  it('does compress the script when the browser accepts gzip, and not otherwise', async () => {
    const app = appWithExport();
    const url = '/_expo/static/js/web/entry-abc123.js';
    const gzipped = await request(app).get(url).set('Accept-Encoding', 'gzip');
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.text).toContain('console.log');
    const plain = await request(app).get(url).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
  });

  const preload = '<link rel="preload" as="script" href="/_expo/static/js/web/signed-in-screens-def456.js" />';

  it('does name the signed-in chunk as a preload when the visitor holds a session cookie', async () => {
    const app = appWithExport();
    for (const cookie of ['better-auth.session_token=abc.def', 'theme=dark; __Secure-better-auth.session_token=abc.def']) {
      const response = await request(app).get('/home').set('Cookie', cookie);
      expect(response.status).toBe(200);
      expect(response.text).toMatch(new RegExp(`${escape(preload)}(<link [^>]+>)*</head>`));
      expect(response.text).toContain('entry-abc123.js');
      expect(response.headers.vary).toMatch(/Cookie/);
      expect(response.headers['cache-control']).toBe('no-cache');
    }
  });

  it('does not preload the signed-in chunk when the visitor has no session cookie', async () => {
    const app = appWithExport();
    for (const cookie of [undefined, 'better-auth.session_data=abc', 'not-better-auth.session_token_x=1']) {
      const call = request(app).get('/sign-in');
      const response = cookie ? await call.set('Cookie', cookie) : await call;
      expect(response.text).toBe(INDEX);
      expect(response.headers.vary).toMatch(/Cookie/);
    }
  });

  it('does preload no script for a signed-in visitor when the export has no signed-in chunk, only the account reads', async () => {
    const app = appWithExport({ signedInChunk: false });
    const response = await request(app).get('/home').set('Cookie', 'better-auth.session_token=abc.def');
    expect(response.text).not.toContain('as="script"');
    expect(response.text.replace(/<link rel="preload" as="fetch" href="[^"]+" crossorigin="use-credentials" \/>/g, '')).toBe(INDEX);
  });

  function appWithStaticExport(base = createTestContext()) {
    const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-web-'));
    const pageHtml = (name: string) => `<!doctype html><html><head><title>${name}</title></head><body><script type="module">globalThis.__EXPO_ROUTER_HYDRATE__=true;</script><script src="/_expo/static/js/web/entry-abc123.js" defer></script></body></html>`;
    for (const file of ['index.html', 'sign-in.html', 'home.html', 'musicians/[id].html', 'musicians/[id]/plan/new.html', 'musicians/[id]/plan/[planId].html', 'mailbox/index.html', 'mailbox/[id].html', '(app)/home.html', '(auth)/sign-in.html', '_sitemap.html', '+not-found.html']) {
      fs.mkdirSync(path.dirname(path.join(webDir, file)), { recursive: true });
      fs.writeFileSync(path.join(webDir, file), pageHtml(file));
    }
    fs.mkdirSync(path.join(webDir, '_expo/static/js/web'), { recursive: true });
    fs.writeFileSync(path.join(webDir, '_expo/static/js/web/signed-in-screens-def456.js'), 'chunk');
    return createApp({ db: base.db, auth: base.auth, mailer: { send: async () => undefined }, env: { PUBLIC_URL: 'http://x', NODE_ENV: 'test' }, now: () => new Date(), storage: memoryStorage(), webDir });
  }

  it('does send someone signed in home from the signed-out screens before any page is drawn, and nobody else', async () => {
    const base = createTestContext();
    await createAccount(base, 'musician', 'hana.okoro@example.test');
    const signIn = await request(base.app).post('/api/auth/sign-in/email').send({ email: 'hana.okoro@example.test', password: PASSWORD });
    const cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    const app = appWithStaticExport(base);
    for (const url of ['/sign-in', '/sign-up', '/forgot-password']) {
      const response = await request(app).get(url).set('Cookie', cookie);
      expect([url, response.status, response.headers.location]).toEqual([url, 302, '/']);
      expect(response.headers['cache-control']).toBe('no-store');
    }
    // Other pages still open for them; a cookie whose session is gone, or none, gets the sign-in page.
    expect((await request(app).get('/home').set('Cookie', cookie)).status).toBe(200);
    for (const other of ['better-auth.session_token=gone.gone', undefined]) {
      const call = request(app).get('/sign-in');
      const response = other ? await call.set('Cookie', other) : await call;
      expect(response.status).toBe(200);
      expect(response.text).toContain('<title>sign-in.html</title>');
    }
  });

  it('does answer each route with its pre-rendered page, dynamic segments included, when the export is static', async () => {
    const app = appWithStaticExport();
    const expected: Record<string, string> = {
      '/': 'index.html',
      '/sign-in': 'sign-in.html',
      '/home': 'home.html',
      '/musicians/m-42': 'musicians/[id].html',
      '/musicians/m-42/plan/new': 'musicians/[id]/plan/new.html',
      '/musicians/m-42/plan/p-7': 'musicians/[id]/plan/[planId].html',
      '/mailbox': 'mailbox/index.html',
      '/mailbox/17': 'mailbox/[id].html',
    };
    for (const [url, file] of Object.entries(expected)) {
      const response = await request(app).get(url);
      expect([url, response.status, response.text]).toEqual([url, 200, expect.stringContaining(`<title>${file}</title>`)]);
      expect(response.headers['cache-control']).toBe('no-cache');
    }
  });

  it('does answer an unknown path with the not-found page and a 404 when the export is static', async () => {
    const app = appWithStaticExport();
    for (const url of ['/nowhere', '/musicians', '/musicians/m-42/plan', '/_sitemap']) {
      const response = await request(app).get(url);
      expect([url, response.status]).toEqual([url, 404]);
      expect(response.text).toContain('<title>+not-found.html</title>');
    }
  });

  it('does preload the signed-in chunk on a pre-rendered page when the visitor holds a session cookie', async () => {
    const app = appWithStaticExport();
    const signedIn = await request(app).get('/musicians/m-42').set('Cookie', 'better-auth.session_token=abc.def');
    expect(signedIn.text).toMatch(new RegExp(`${escape(preload)}(<link [^>]+>)*</head>`));
    expect(signedIn.text).toContain('<title>musicians/[id].html</title>');
    const signedOut = await request(app).get('/musicians/m-42');
    expect(signedOut.text).not.toContain('rel="preload"');
  });

  it("does start a signed-in visitor's first API reads with the page: the account everywhere, the day on Today", async () => {
    const app = appWithStaticExport();
    const fetched = (html: string) => [...html.matchAll(/<link rel="preload" as="fetch" href="([^"]+)" crossorigin="use-credentials" \/>/g)].map((m) => m[1]);
    const cookie = 'better-auth.session_token=abc.def';
    expect(fetched((await request(app).get('/home').set('Cookie', cookie)).text)).toEqual(['/api/auth/get-session', '/api/me', '/api/today', '/api/me/musician']);
    expect(fetched((await request(app).get('/musicians/m-42').set('Cookie', cookie)).text)).toEqual(['/api/auth/get-session', '/api/me']);
    expect(fetched((await request(app).get('/home')).text)).toEqual([]);
  });

  it('does allow a page its own inline script by hash in the Content-Security-Policy, and no other inline script', async () => {
    const app = appWithStaticExport();
    const hash = crypto.createHash('sha256').update('globalThis.__EXPO_ROUTER_HYDRATE__=true;').digest('base64');
    const response = await request(app).get('/sign-in');
    const scriptSrc = String(response.headers['content-security-policy']).split(';').find((directive) => directive.startsWith('script-src'));
    expect(scriptSrc).toBe(`script-src 'self' 'sha256-${hash}'`);
    const api = await request(app).get('/api/health');
    expect(String(api.headers['content-security-policy'])).toContain("script-src 'self';");
  });
});
