import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..');

export interface RunningServer {
  url: string;
  bareUrl: string;
  stop: () => Promise<void>;
}

/** Starts bench/serve.ts through tsx's own binary (killing `npx` would leave the child on the port). */
export async function startServer(options: { port: number; dbFile: string; webDir?: string }): Promise<RunningServer> {
  const child: ChildProcess = spawn(path.join(ROOT, 'node_modules/.bin/tsx'), [path.join(ROOT, 'bench/serve.ts')], {
    cwd: ROOT,
    env: { ...process.env, TZ: 'UTC', BENCH_PORT: String(options.port), BENCH_DB: options.dbFile, ...(options.webDir ? { WEB_DIR: options.webDir } : {}) },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('bench server did not start in 60 s')), 60_000);
    child.stdout?.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('ready')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.on('exit', (code) => reject(new Error(`bench server exited (${code})`)));
  });
  return {
    url: `http://127.0.0.1:${options.port}`,
    bareUrl: `http://127.0.0.1:${options.port + 1}`,
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

/** Signs in through the API and returns the session cookie to send with later requests. */
export async function signIn(url: string, email: string, password: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: url },
    body: JSON.stringify({ email, password }),
  });
  if (!response.ok) throw new Error(`sign-in failed for ${email}: ${response.status} ${await response.text()}`);
  const cookie = response.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  if (!cookie) throw new Error(`no session cookie for ${email}`);
  return cookie;
}

/** GET with the cookie; throws unless 200, and reads the body so the timing includes it. */
export async function getOk(url: string, cookie: string): Promise<unknown> {
  const response = await fetch(url, { headers: { cookie } });
  if (response.status !== 200) throw new Error(`${url}: ${response.status} ${await response.text()}`);
  return response.json();
}
