import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

export interface RealServer {
  baseUrl: string;
  child: ChildProcess;
  log: () => string;
}

/** Starts server/index.ts as its own process on a free port (for crash and load tests). */
export async function startRealServer(databasePath: string, options: { port?: number } = {}): Promise<RealServer> {
  const port = options.port ?? (await freePort());
  const baseUrl = `http://127.0.0.1:${port}`;
  const root = path.resolve(__dirname, '../../..');
  // One process (node with tsx as a loader), so SIGKILL hits the server itself, not a wrapper.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: baseUrl,
      DATABASE_PATH: databasePath,
      FAKE_SMTP_PORT: String(await freePort()),
      WEB_DIR: path.join(path.dirname(databasePath), 'no-web'),
      SMTP_URL: '',
      SIGN_IN_LIMIT_PER_MINUTE: '600',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`server did not start:\n${output}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return { baseUrl, child, log: () => output };
}

/** Signs in through the real HTTP API and returns the session cookie. */
export async function signInCookie(baseUrl: string, email: string, password: string): Promise<string> {
  const response = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: baseUrl },
    body: JSON.stringify({ email, password }),
  });
  if (!response.ok) throw new Error(`sign-in failed for ${email}: ${response.status}`);
  return (response.headers.getSetCookie?.() ?? []).map((cookie) => cookie.split(';')[0]).join('; ');
}
