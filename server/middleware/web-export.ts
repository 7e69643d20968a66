import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import express, { Router, type Request } from 'express';

// Everything Expo writes under these folders carries a content hash in its file name (scripts under
// /_expo/static, fonts and images under /assets), so a new build never reuses a URL: browsers may keep
// them for a year without asking again.
const HASHED = /^\/(_expo\/static|assets)\//;
const IMMUTABLE = 'public, max-age=31536000, immutable';
// A page names the current script, so it must be revalidated on every visit or a phone would keep
// running last month's build. favicon.ico and metadata.json have fixed names: a short cache.
const REVALIDATE = 'no-cache';
const SHORT = 'public, max-age=3600';

// The signed-in screens are a chunk of their own (components/layout/signed-in-screens.ts) that the app
// asks for only once it runs. A visitor who holds a session cookie is about to need it: their page names
// it as a preload, so it downloads beside the entry script instead of after it.
const SIGNED_IN_CHUNK = /^signed-in-screens-[0-9a-f]+\.js$/;
const SESSION_COOKIE = /(?:^|;\s*)(?:__Secure-)?better-auth\.session_token=/;
const SCRIPTS = '_expo/static/js/web';

// What the app asks the API for first, fetched while the page and its scripts download instead of after
// the app has started: the session and the account on every page, and the day itself on the musician's
// Today (/home). The links must match the app's own requests (same URL, credentials included) to be used;
// the app starts the same reads as soon as it knows the account (hooks/use-first-reads.ts).
const ACCOUNT_READS = ['/api/auth/get-session', '/api/me'];
const FIRST_READS: Record<string, string[]> = { home: ['/api/today', '/api/me/musician'] };
const fetchPreload = (href: string) => `<link rel="preload" as="fetch" href="${href}" crossorigin="use-credentials" />`;

interface Page {
  /** Path segments; `null` stands for a dynamic segment such as `[id]`. */
  segments: (string | null)[];
  plain: string;
  signedIn: string;
  /** CSP source expressions (`'sha256-...'`) of the page's inline scripts. */
  scriptHashes: string[];
}

// A pre-rendered page carries one inline script (Expo Router's flag to take the page over rather than
// draw it again). The server's Content-Security-Policy allows scripts from 'self' only, so each page's
// answer allows its own inline scripts by hash, and nothing else.
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

function hasSession(req: Request): boolean {
  return SESSION_COOKIE.test(req.headers.cookie ?? '');
}

function signedInChunk(root: string): string | undefined {
  const dir = path.join(root, SCRIPTS);
  return fs.existsSync(dir) ? fs.readdirSync(dir).find((file) => SIGNED_IN_CHUNK.test(file)) : undefined;
}

function page(root: string, file: string, chunk: string | undefined): Page {
  const plain = fs.readFileSync(path.join(root, file), 'utf8');
  const route = file.replace(/\.html$/, '').split('/').filter((segment, index, all) => !(segment === 'index' && index === all.length - 1));
  const preload = [
    chunk ? `<link rel="preload" as="script" href="/${SCRIPTS}/${chunk}" />` : '',
    ...[...ACCOUNT_READS, ...(FIRST_READS[route.join('/')] ?? [])].map(fetchPreload),
  ].join('');
  return {
    segments: route.map((segment) => (/^\[[^\]]+\]$/.test(segment) ? null : segment)),
    plain,
    signedIn: preload && plain.includes('</head>') ? plain.replace('</head>', `${preload}</head>`) : plain,
    scriptHashes: inlineScriptHashes(plain),
  };
}

/**
 * The pages of the export, most specific first. Expo writes one pre-rendered page per route (`sign-in.html`,
 * `musicians/[id].html`) and copies under group folders such as `(app)/`, which are not URLs: skipped.
 * A single-page export has only `index.html`, which then answers every path.
 */
function readPages(root: string): { pages: Page[]; notFound: Page | undefined } {
  const chunk = signedInChunk(root);
  const files = (fs.readdirSync(root, { recursive: true }) as string[])
    .map((file) => file.split(path.sep).join('/'))
    .filter((file) => file.endsWith('.html') && !/(^|\/)[(_]/.test(file) && !file.startsWith('assets/'));
  const pages = files.filter((file) => !/(^|\/)\+/.test(file)).map((file) => page(root, file, chunk));
  // Static segments beat dynamic ones at the first place they differ: /musicians/new before /musicians/[id].
  const rank = (p: Page) => p.segments.map((segment) => (segment === null ? '1' : '0')).join('');
  pages.sort((a, b) => b.segments.length - a.segments.length || rank(a).localeCompare(rank(b)));
  const notFound = files.includes('+not-found.html') ? page(root, '+not-found.html', chunk) : undefined;
  return { pages, notFound };
}

function matches(pageSegments: (string | null)[], urlSegments: string[]): boolean {
  return pageSegments.length === urlSegments.length && pageSegments.every((segment, index) => segment === null || segment === urlSegments[index]);
}

// Screens with no use to someone signed in: the server sends them home before any page is drawn (the app
// does the same for its own navigations, app/(auth)/_layout.tsx).
const SIGNED_OUT_ONLY = new Set(['/sign-in', '/sign-up', '/forgot-password']);

export interface WebExportOptions {
  /** Whether the request comes with a valid session (not merely a session cookie). */
  isSignedIn?: (req: Request) => Promise<boolean>;
}

/** Serves the web export: hashed files for a year, each route its pre-rendered page, revalidated. */
export function webExport(webDir: string, options: WebExportOptions = {}): Router {
  const root = path.resolve(webDir);
  // Read once: `npm start` exports before the server starts, and a new export means a restart.
  const { pages, notFound } = readPages(root);
  const single = pages.length === 1 && pages[0]?.segments.length === 0;
  const router = Router();
  router.use(
    express.static(root, {
      index: false,
      // A folder such as /mailbox is a screen (its index page), not a redirect to /mailbox/.
      redirect: false,
      setHeaders: (res, filePath) => {
        const urlPath = `/${path.relative(root, filePath).split(path.sep).join('/')}`;
        if (HASHED.test(urlPath)) res.setHeader('Cache-Control', IMMUTABLE);
        else if (urlPath.endsWith('.html')) res.setHeader('Cache-Control', REVALIDATE);
        else res.setHeader('Cache-Control', SHORT);
      },
    }),
  );
  // Every other path is a screen: its pre-rendered page, which the app's router then takes over (deep
  // links included). An unknown path gets the not-found page with a 404, or, from a single-page export,
  // index.html. The page depends on the cookie, so caches must keep the two answers apart.
  router.get('/{*splat}', async (req, res) => {
    if (SIGNED_OUT_ONLY.has(req.path) && hasSession(req) && (await options.isSignedIn?.(req))) {
      return void res.set({ 'Cache-Control': 'no-store', Vary: 'Cookie' }).redirect(302, '/');
    }
    // Express has already refused a path that is not valid percent-encoding (its route parameter).
    const urlSegments = req.path.split('/').filter(Boolean).map((segment) => decodeURIComponent(segment));
    const found = single ? pages[0] : pages.find((p) => matches(p.segments, urlSegments));
    const answer = found ?? notFound;
    if (!answer) return void res.status(404).type('text').send('Not found');
    res.status(found ? 200 : 404).set({ 'Cache-Control': REVALIDATE, Vary: 'Cookie' }).type('html');
    const policy = res.getHeader('Content-Security-Policy');
    if (typeof policy === 'string') res.setHeader('Content-Security-Policy', allowScripts(policy, answer.scriptHashes));
    res.send(hasSession(req) ? answer.signedIn : answer.plain);
  });
  return router;
}
