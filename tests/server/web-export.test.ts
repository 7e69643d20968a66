import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { memoryStorage } from '@/server/lib/storage';
import { createTestContext } from './support/test-app';

function appWithExport() {
  const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ritorno-web-'));
  fs.writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><title>Ritorno</title>');
  fs.writeFileSync(path.join(webDir, 'favicon.ico'), 'icon');
  fs.mkdirSync(path.join(webDir, '_expo/static/js/web'), { recursive: true });
  fs.writeFileSync(path.join(webDir, '_expo/static/js/web/entry-abc123.js'), `console.log("${'x'.repeat(4000)}")`);
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
});
