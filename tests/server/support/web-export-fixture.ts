import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { memoryStorage } from '@/server/lib/storage';
import { createTestContext, PASSWORD, type TestContext } from './test-app';

// Route patterns as Expo writes them in server/_expo/routes.json (copied from a real export).
const ROUTES: Record<string, string> = {
  '/(app)/index': '^(?:/\\(app\\))?(?:/)?$',
  '/(auth)/sign-in': '^(?:/\\(auth\\))?/sign\\-in(?:/)?$',
  '/(auth)/sign-up': '^(?:/\\(auth\\))?/sign\\-up(?:/)?$',
  '/(auth)/forgot-password': '^(?:/\\(auth\\))?/forgot\\-password(?:/)?$',
  '/(app)/(musician)/home': '^(?:/\\(app\\))?(?:/\\(musician\\))?/home(?:/)?$',
  '/(app)/(musician)/plan': '^(?:/\\(app\\))?(?:/\\(musician\\))?/plan(?:/)?$',
  '/(app)/(clinician)/musicians/[id]/index': '^(?:/\\(app\\))?(?:/\\(clinician\\))?/musicians/(?<id>[^/]+?)(?:/)?$',
  '/(app)/(clinician)/musicians/[id]/plan/new': '^(?:/\\(app\\))?(?:/\\(clinician\\))?/musicians/(?<id>[^/]+?)/plan/new(?:/)?$',
  '/(app)/(admin)/mailbox/index': '^(?:/\\(app\\))?(?:/\\(admin\\))?/mailbox(?:/)?$',
};

// A stand-in for Expo's page renderer: the page names its path and carries the data it was given, as
// the real one does (a script setting __EXPO_ROUTER_LOADER_DATA__). With `unfinishedFirst`, it leaves a
// part for the browser (`<!--$!-->`) until a streamed render has waited for every part, as the real one
// does before the signed-in screens have loaded on the server.
const RENDERER = `
let loaded = !UNFINISHED_FIRST;
exports.calls = [];
exports.getStaticContent = async (location, { assets, loader }) => {
  exports.calls.push('static ' + location.pathname);
  const data = loader ? '<script id="expo-router-data">globalThis.__EXPO_ROUTER_LOADER_DATA__ = JSON.parse(' + JSON.stringify(JSON.stringify({ [loader.key]: loader.data })) + ');</script>' : '';
  const body = loaded ? '<main>drawn ' + location.pathname + '</main>' : '<!--$!--><template></template><!--/$-->';
  return '<!DOCTYPE html><html><head><title>page ' + location.pathname + '</title>' + data + '</head><body>' + body + assets.js.map((src) => '<script src="' + src + '" defer></script>').join('') + '</body></html>';
};
exports.getStreamingContent = async (location) => {
  exports.calls.push('streamed ' + location.pathname);
  loaded = true;
  const stream = new ReadableStream({ start(controller) { controller.enqueue(new TextEncoder().encode('<html></html>')); controller.close(); } });
  stream.allReady = Promise.resolve();
  return stream;
};
`;

export interface FakeExportOptions {
  signedInChunk?: boolean;
  unfinishedFirst?: boolean;
  rendering?: 'ssr' | 'none';
}

/** A web export laid out as `expo export` writes one with server rendering (app.json web.output "server"). */
export function fakeWebExport({ signedInChunk = true, unfinishedFirst = false, rendering = 'ssr' }: FakeExportOptions = {}): string {
  // Under node_modules, which jest neither transforms nor watches: the renderer is loaded as Expo's is.
  const parent = path.join(__dirname, '../../../node_modules/.cache/ritorno-web-tests');
  fs.mkdirSync(parent, { recursive: true });
  const webDir = fs.mkdtempSync(path.join(parent, 'export-'));
  const write = (file: string, content: string) => {
    fs.mkdirSync(path.dirname(path.join(webDir, file)), { recursive: true });
    fs.writeFileSync(path.join(webDir, file), content);
  };
  write('client/favicon.ico', 'icon');
  write('client/_expo/static/js/web/entry-abc123.js', `console.log("${'x'.repeat(4000)}")`);
  if (signedInChunk) write('client/_expo/static/js/web/signed-in-screens-def456.js', 'chunk');
  write('client/assets/assets/fonts/Figtree.abc123.ttf', 'font');
  const manifest = {
    htmlRoutes: Object.entries(ROUTES).map(([page, namedRegex]) => ({ page, namedRegex })),
    notFoundRoutes: [{ page: '/+not-found', namedRegex: '^(?:/(?<notfound>.+?))?(?:/)?$' }],
    assets: { css: [], js: ['/_expo/static/js/web/entry-abc123.js'], favicon: '/favicon.ico' },
    ...(rendering === 'ssr' ? { rendering: { mode: 'ssr', file: '_expo/server/render.js' } } : {}),
  };
  write('server/_expo/routes.json', JSON.stringify(manifest));
  write('server/_expo/server/render.js', RENDERER.replace('UNFINISHED_FIRST', String(unfinishedFirst)));
  return webDir;
}

/** The app of `base` (its database and accounts) serving `webDir`. */
export function appServing(webDir: string, base: TestContext = createTestContext()) {
  return createApp({ db: base.db, auth: base.auth, mailer: { send: async () => undefined }, env: { PUBLIC_URL: 'http://x', NODE_ENV: 'test' }, now: () => base.clock.now, storage: memoryStorage(), webDir });
}

/** The session cookie of `email`, signed in on `base`. */
export async function sessionCookie(base: TestContext, email: string): Promise<string> {
  const signIn = await request(base.app).post('/api/auth/sign-in/email').send({ email, password: PASSWORD });
  return (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
}

/** The first reads a drawn page carries (Expo's loader data, under the page's path), or undefined. */
export function readsIn(html: string): Record<string, unknown> | undefined {
  const literal = /__EXPO_ROUTER_LOADER_DATA__ = JSON\.parse\(("(?:[^"\\]|\\.)*")\)/.exec(html)?.[1];
  if (!literal) return undefined;
  const data = JSON.parse(JSON.parse(literal) as string) as Record<string, Record<string, unknown>>;
  return Object.values(data)[0];
}
