import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import { chromium } from 'playwright-core';
import { kb, ratio, verdict, type Bench } from './harness';

const ROOT = path.resolve(__dirname, '..');
export const WORK = '/tmp/ritorno-bench';
export const WEB_DIR = path.join(WORK, 'web');
const MINIMAL = path.join(WORK, 'minimal');
/** The minimal app's export, built by the bundle bench (and served to Lighthouse as its baseline). */
export const MINIMAL_DIST = path.join(MINIMAL, 'dist');

const EXPORT_ENV = { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' };

/** Builds the web app as `npm start` does, into WEB_DIR (also served to Lighthouse). */
export function exportWeb(): void {
  fs.rmSync(WEB_DIR, { recursive: true, force: true });
  execFileSync(path.join(ROOT, 'node_modules/.bin/expo'), ['export', '--platform', 'web', '--output-dir', WEB_DIR], { cwd: ROOT, env: EXPORT_ENV, stdio: 'pipe', timeout: 300_000 });
}

/** The smallest Expo Router app of the same SDK: one route, the project's own node_modules. */
function exportMinimal(): string {
  fs.rmSync(MINIMAL, { recursive: true, force: true });
  fs.mkdirSync(path.join(MINIMAL, 'app'), { recursive: true });
  fs.symlinkSync(path.join(ROOT, 'node_modules'), path.join(MINIMAL, 'node_modules'));
  fs.writeFileSync(path.join(MINIMAL, 'package.json'), JSON.stringify({ name: 'minimal-router-app', private: true, main: 'expo-router/entry' }));
  fs.writeFileSync(path.join(MINIMAL, 'app.json'), JSON.stringify({ expo: { name: 'minimal', slug: 'minimal', web: { bundler: 'metro', output: 'single' }, plugins: ['expo-router'] } }));
  fs.writeFileSync(path.join(MINIMAL, 'app', 'index.tsx'), "import { Text } from 'react-native';\nexport default function Index() {\n  return <Text>Hello</Text>;\n}\n");
  const out = MINIMAL_DIST;
  execFileSync(path.join(ROOT, 'node_modules/.bin/expo'), ['export', '--platform', 'web', '--output-dir', out], { cwd: MINIMAL, env: EXPORT_ENV, stdio: 'pipe', timeout: 300_000 });
  return out;
}

interface JsSize {
  raw: number;
  gzip: number;
  files: number;
}

/** Given JavaScript files of an export, raw and gzipped (level 6, what a server's compression sends). */
function sizeOf(dir: string, files: string[]): JsSize {
  let raw = 0;
  let gzip = 0;
  for (const file of files) {
    const content = fs.readFileSync(path.join(dir, file));
    raw += content.length;
    gzip += zlib.gzipSync(content, { level: 6 }).length;
  }
  return { raw, gzip, files: files.length };
}

/** Every JavaScript file of an export. */
function totalJs(dir: string): JsSize {
  return sizeOf(dir, (fs.readdirSync(dir, { recursive: true }) as string[]).filter((f) => f.endsWith('.js')));
}

/**
 * The JavaScript a first visit downloads: Chromium opens `url` with an empty cache, waits for `selector`
 * and for the network to go quiet, and every script it fetched from the export is counted (the ones
 * index.html names and the chunks the page asked for while starting).
 */
async function firstVisitJs(dir: string, url: string, selector: string): Promise<JsSize> {
  const browser = await chromium.launch({ executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'] });
  try {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    const scripts = new Set<string>();
    page.on('response', (response) => {
      const { pathname } = new URL(response.url());
      if (pathname.endsWith('.js') && fs.existsSync(path.join(dir, pathname))) scripts.add(pathname.slice(1));
    });
    await page.goto(url);
    await page.waitForSelector(selector, { timeout: 60_000 });
    await page.waitForLoadState('networkidle');
    if (scripts.size === 0) throw new Error(`no script of the export was loaded by ${url}`);
    return sizeOf(dir, [...scripts]);
  } finally {
    await browser.close();
  }
}

/** Serves the minimal app's export (a single page) with plain static files while `fn` runs. */
async function serving<T>(dir: string, fn: (url: string) => Promise<T>): Promise<T> {
  const app = express();
  app.use(express.static(dir, { extensions: ['html'] }));
  app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dir, 'index.html')));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  try {
    return await fn(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
  } finally {
    await new Promise((resolve) => server.close(resolve));
  }
}

function rows(measure: string, ours: JsSize, minimal: JsSize, budget: boolean) {
  const row = (what: 'raw' | 'gzip') => ({
    area: 'web',
    measure: `${measure}, ${what}${what === 'raw' ? ` (${ours.files} files)` : ''}`,
    ours: kb(ours[what]),
    baseline: `minimal Expo Router app ${kb(minimal[what])}`,
    ratio: ratio(ours[what], minimal[what]),
    budget: budget ? '<= 1.5x' : '',
    verdict: budget ? verdict(ours[what] / minimal[what] <= 1.5) : ('' as const),
  });
  return [row('raw'), row('gzip')];
}

/**
 * Two figures, each beside the minimal app. The budget is judged on the first visit to sign-in (the
 * JavaScript a phone must download and run before anyone can use Ritorno); the total (every chunk,
 * signed-in screens included, fetched once and then cached for a year) is reported beside it.
 */
export const bundleBench: Bench = {
  name: 'web bundle',
  run: async ({ server }) => {
    if (!server) throw new Error('the bundle bench needs the server');
    const minimalDir = exportMinimal();
    const minimalTotal = totalJs(minimalDir);
    const minimalFirst = await serving(minimalDir, (url) => firstVisitJs(minimalDir, `${url}/`, 'text=Hello'));
    // Ours as the server sends it (pages drawn on request); what browsers download is under client/
    // (server/ holds the page renderer, never sent).
    const clientDir = path.join(WEB_DIR, 'client');
    const oursTotal = totalJs(clientDir);
    const oursFirst = await firstVisitJs(clientDir, `${server.url}/sign-in`, '[data-testid="sign-in-submit"]');
    return [
      ...rows('JavaScript a first visit to sign-in loads', oursFirst, minimalFirst, true),
      ...rows('JavaScript in total (all chunks)', oursTotal, minimalTotal, false),
    ];
  },
};
