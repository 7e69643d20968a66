// `npm start`: export the web app (skip with SKIP_WEB_BUILD=1), then run the server, which
// migrates, seeds the demo on an empty database, starts the fake mail server and serves everything.
import { spawn, spawnSync } from 'node:child_process';

const env = { ...process.env, EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', CI: process.env.CI ?? '1' };

if (process.env.SKIP_WEB_BUILD !== '1') {
  console.log('Building the web app (first run takes about a minute)...');
  const build = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', process.env.WEB_DIR ?? 'dist'], {
    stdio: 'inherit',
    env,
  });
  if (build.status !== 0) {
    console.error('The web build failed; see the messages above.');
    process.exit(build.status ?? 1);
  }
}

// One process (node with tsx as a loader), so signals reach the server itself.
const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { stdio: 'inherit', env: process.env });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
