import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { kb, ratio, verdict, type Bench } from './harness';

const ROOT = path.resolve(__dirname, '..');
export const WORK = '/tmp/ritorno-bench';
export const WEB_DIR = path.join(WORK, 'web');
const MINIMAL = path.join(WORK, 'minimal');

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
  const out = path.join(MINIMAL, 'dist');
  execFileSync(path.join(ROOT, 'node_modules/.bin/expo'), ['export', '--platform', 'web', '--output-dir', out], { cwd: MINIMAL, env: EXPORT_ENV, stdio: 'pipe', timeout: 300_000 });
  return out;
}

/** Every JavaScript file of an export, raw and gzipped (level 6, what a server's compression sends). */
function jsSize(dir: string): { raw: number; gzip: number; files: number } {
  const files = (fs.readdirSync(dir, { recursive: true }) as string[]).filter((f) => f.endsWith('.js'));
  let raw = 0;
  let gzip = 0;
  for (const file of files) {
    const content = fs.readFileSync(path.join(dir, file));
    raw += content.length;
    gzip += zlib.gzipSync(content, { level: 6 }).length;
  }
  return { raw, gzip, files: files.length };
}

export const bundleBench: Bench = {
  name: 'web bundle',
  run: () => {
    const ours = jsSize(WEB_DIR);
    const minimal = jsSize(exportMinimal());
    return [
      { area: 'web', measure: `JavaScript raw (${ours.files} files)`, ours: kb(ours.raw), baseline: `minimal Expo Router app ${kb(minimal.raw)}`, ratio: ratio(ours.raw, minimal.raw), budget: '<= 1.5x', verdict: verdict(ours.raw / minimal.raw <= 1.5) },
      { area: 'web', measure: 'JavaScript gzip', ours: kb(ours.gzip), baseline: `minimal Expo Router app ${kb(minimal.gzip)}`, ratio: ratio(ours.gzip, minimal.gzip), budget: '<= 1.5x', verdict: verdict(ours.gzip / minimal.gzip <= 1.5) },
    ];
  },
};
