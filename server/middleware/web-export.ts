import { createHash } from 'node:crypto';
import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import express, { Router, type Request } from 'express';
import type { FirstReads } from '../../shared/web/first-reads';

// Expo's server export (app.json: web output "server", expo-router's server rendering): `client/` holds
// what browsers download, `server/` the route manifest and the module that draws a page.
const MANIFEST = 'server/_expo/routes.json';

// Everything Expo writes under these folders carries a content hash in its file name (scripts under
// /_expo/static, fonts and images under /assets), so a new build never reuses a URL: browsers may keep
// them for a year without asking again. favicon.ico and metadata.json have fixed names: a short cache.
const HASHED = /^\/(_expo\/static|assets)\//;
const IMMUTABLE = 'public, max-age=31536000, immutable';
const SHORT = 'public, max-age=3600';
// A page is drawn for its visitor, with their data in it: never stored by a cache, the browser's included.
const PAGE = 'private, no-store';

// The signed-in screens are a chunk of their own (components/layout/signed-in-screens.ts) that the app
// asks for only once it runs. A visitor who is signed in is about to need it: their page names it as a
// preload, so it downloads beside the entry script instead of after it.
const SIGNED_IN_CHUNK = /^signed-in-screens-[0-9a-f]+\.js$/;
const SCRIPTS = '_expo/static/js/web';

interface RouteEntry {
  page: string;
  namedRegex: string;
}

interface Manifest {
  htmlRoutes: RouteEntry[];
  notFoundRoutes: RouteEntry[];
  assets: { css: string[]; js: string[]; favicon?: string };
  rendering?: { mode: string; file: string };
}

/** The page renderer Expo exports (`@expo/router-server`'s renderStaticContent). */
interface RenderModule {
  getStaticContent(location: URL, options: { assets: Manifest['assets']; loader?: { key: string; data: unknown } }): Promise<string>;
  getStreamingContent(
    location: URL,
    options: { assets: Manifest['assets']; loader?: { key: string; data: unknown } },
  ): Promise<ReadableStream<Uint8Array> & { allReady?: Promise<void> }>;
}

/** Who asks for a page: signed in or not, and the first reads answered for them (server/services/first-reads.service.ts). */
export interface PageVisitor {
  signedIn: boolean;
  reads?: FirstReads;
}

export interface WebExportOptions {
  /** Reads the request's session; without it every visitor is drawn the signed-out page. */
  visitor?: (req: Request, pathname: string) => Promise<PageVisitor>;
}

/** Whether `webDir` holds a web export this server can serve. */
export function isWebExport(webDir: string): boolean {
  return fs.existsSync(path.join(webDir, MANIFEST));
}

// A page carries inline scripts (Expo Router's flag to take the page over, and the data the page was drawn
// with). The server's Content-Security-Policy allows scripts from 'self' only, so each answer allows its
// own inline scripts by hash, and nothing else.
const INLINE_SCRIPT = /<script(?![^>]*\bsrc=)[^>]*>([\s\S]*?)<\/script>/g;

function inlineScriptHashes(html: string): string[] {
  return [...html.matchAll(INLINE_SCRIPT)].map((match) => `'sha256-${createHash('sha256').update(match[1] ?? '').digest('base64')}'`);
}

/** The policy with the hashes added to its script-src (or to a script-src made from default-src). */
function allowScripts(policy: string, hashes: string[]): string {
  if (hashes.length === 0) return policy;
  const directives = policy.split(';').map((directive) => directive.trim()).filter(Boolean);
  const scriptSrc = directives.findIndex((directive) => directive.startsWith('script-src '));
  if (scriptSrc >= 0) {
    directives[scriptSrc] = `${directives[scriptSrc]} ${hashes.join(' ')}`;
  } else {
    const defaults = directives.find((directive) => directive.startsWith('default-src '));
    if (!defaults) return policy;
    directives.push(`script-src ${defaults.slice('default-src '.length)} ${hashes.join(' ')}`);
  }
  return directives.join(';');
}

function signedInChunk(clientDir: string): string | undefined {
  const dir = path.join(clientDir, SCRIPTS);
  return fs.existsSync(dir) ? fs.readdirSync(dir).find((file) => SIGNED_IN_CHUNK.test(file)) : undefined;
}

/** One page drawn at a time: the renderer resets module-level state (fonts, navigation contexts) per page. */
function oneAtATime() {
  let last: Promise<unknown> = Promise.resolve();
  return <T>(task: () => Promise<T>): Promise<T> => {
    const next = last.then(task, task);
    last = next.catch(() => undefined);
    return next;
  };
}

// React's mark for a part of the page it could not draw on the server, left for the browser.
const UNFINISHED = '<!--$!-->';

// Screens with no use to someone signed in: the server sends them home before any page is drawn (the app
// does the same for its own navigations, app/(auth)/_layout.tsx).
const SIGNED_OUT_ONLY = new Set(['/sign-in', '/sign-up', '/forgot-password']);

/**
 * Serves the web export: hashed files for a year, and each screen drawn on request for its visitor, with
 * the data its first draw needs inside (the app takes the page over from there, deep links included). An
 * unknown path gets the not-found screen with a 404.
 */
export function webExport(webDir: string, options: WebExportOptions = {}): Router {
  const root = path.resolve(webDir);
  const clientDir = path.join(root, 'client');
  // Read once: `npm start` exports before the server starts, and a new export means a restart.
  const manifest = JSON.parse(fs.readFileSync(path.join(root, MANIFEST), 'utf8')) as Manifest;
  if (manifest.rendering?.mode !== 'ssr') throw new Error(`${webDir} is not a server-rendered export (app.json: web.output "server")`);
  const rendererFile = path.join(root, 'server', manifest.rendering.file);
  let render: RenderModule | undefined;
  const routes = manifest.htmlRoutes.map((route) => new RegExp(route.namedRegex));
  const notFound = manifest.notFoundRoutes.length > 0;
  const chunk = signedInChunk(clientDir);
  const preload = chunk ? `<link rel="preload" as="script" href="/${SCRIPTS}/${chunk}" />` : '';
  const drawing = oneAtATime();

  async function draw(pathname: string, search: string, visitor: PageVisitor): Promise<string> {
    render ??= createRequire(__filename)(rendererFile) as RenderModule;
    const loader = visitor.reads ? { key: pathname, data: visitor.reads } : undefined;
    const url = new URL(`http://localhost${pathname}${search}`);
    const renderer = render;
    return drawing(async () => {
      // Drawn in one pass, every part in place: a streamed page would reveal its larger parts from
      // templates with a script, after the first paint. A part that is not loaded yet on the server
      // (the signed-in screens, until the first signed-in page) comes out as a fallback for the browser
      // to draw (`<!--$!-->`): that page is drawn again, waiting for every part, which loads it for good.
      let html = await renderer.getStaticContent(url, { assets: manifest.assets, loader });
      if (html.includes(UNFINISHED)) {
        const stream = await renderer.getStreamingContent(url, { assets: manifest.assets, loader });
        await stream.allReady;
        await new Response(stream).text();
        html = await renderer.getStaticContent(url, { assets: manifest.assets, loader });
      }
      // Not hydrated: the app draws its own copy and swaps it in (index.ts; DEVELOPERS.md, "Taking the
      // page over"), so the page carries no hydration flag.
      return visitor.signedIn && preload ? html.replace('</head>', `${preload}</head>`) : html;
    });
  }

  const router = Router();
  router.use(
    express.static(clientDir, {
      index: false,
      // A folder such as /mailbox is a screen (its index page), not a redirect to /mailbox/.
      redirect: false,
      setHeaders: (res, filePath) => {
        const urlPath = `/${path.relative(clientDir, filePath).split(path.sep).join('/')}`;
        res.setHeader('Cache-Control', HASHED.test(urlPath) ? IMMUTABLE : SHORT);
      },
    }),
  );
  router.get('/{*splat}', async (req, res) => {
    const visitor = (await options.visitor?.(req, req.path)) ?? { signedIn: false };
    if (SIGNED_OUT_ONLY.has(req.path) && visitor.signedIn) {
      return void res.set({ 'Cache-Control': 'no-store', Vary: 'Cookie' }).redirect(302, '/');
    }
    const found = routes.some((route) => route.test(req.path));
    if (!found && !notFound) return void res.status(404).type('text').send('Not found');
    const search = req.url.includes('?') ? req.url.slice(req.url.indexOf('?')) : '';
    const html = await draw(req.path, search, visitor);
    res.status(found ? 200 : 404).set({ 'Cache-Control': PAGE, Vary: 'Cookie' }).type('html');
    const policy = res.getHeader('Content-Security-Policy');
    if (typeof policy === 'string') res.setHeader('Content-Security-Policy', allowScripts(policy, inlineScriptHashes(html)));
    res.send(html);
  });
  return router;
}
