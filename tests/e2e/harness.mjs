// Starts what the browser tests need: Debian's Chromium, a fresh web export and a server on free ports.
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export function ensureChromium() {
  const found = [process.env.CHROME_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].find((p) => p && existsSync(p));
  if (found) return found;
  if (process.getuid?.() !== 0) {
    throw new Error('Chromium is missing: run `sudo apt-get install -y chromium` (or set CHROME_PATH) and try again.');
  }
  console.log('Installing Debian Chromium for the browser tests (about a minute)...');
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  return '/usr/bin/chromium';
}

function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

export function buildWeb(outDir) {
  const env = { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: '1' };
  const result = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', outDir], { stdio: 'inherit', env });
  if (result.status !== 0) throw new Error('The web export failed.');
}

/** Starts the real server (migrate, seed, fake SMTP) on a fresh database; resolves when it answers. */
export async function startServer() {
  const workDir = mkdtempSync(path.join(os.tmpdir(), 'ritorno-e2e-'));
  const webDir = path.join(workDir, 'dist');
  buildWeb(webDir);
  const [port, smtpPort] = [await freePort(), await freePort()];
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: baseUrl,
      FAKE_SMTP_PORT: String(smtpPort),
      DATABASE_PATH: path.join(workDir, 'ritorno.db'),
      UPLOAD_DIR: path.join(workDir, 'uploads'),
      WEB_DIR: webDir,
      // Every scenario signs in from 127.0.0.1; the per-address limit would otherwise trip mid-run.
      SIGN_IN_LIMIT_PER_MINUTE: '600',
      SMTP_URL: '',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout.on('data', (chunk) => (log += chunk));
  child.stderr.on('data', (chunk) => (log += chunk));
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited early:\n${log}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) break;
    } catch {
      // not up yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  if (Date.now() >= deadline) throw new Error(`The server did not answer within 60 s:\n${log}`);
  return {
    baseUrl,
    log: () => log,
    stop: () =>
      new Promise((resolve) => {
        child.once('exit', resolve);
        child.kill('SIGTERM');
      }),
  };
}
