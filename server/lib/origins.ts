/**
 * Origins the browser app may call from: the public URL and, outside production, the same port on every
 * loopback name (people open localhost or 127.0.0.1 interchangeably) and the Expo dev server.
 */
export function trustedOrigins(env: { PUBLIC_URL: string; NODE_ENV: string }): string[] {
  const origins = new Set([new URL(env.PUBLIC_URL).origin]);
  if (env.NODE_ENV !== 'production') {
    const { port, protocol } = new URL(env.PUBLIC_URL);
    for (const host of ['localhost', '127.0.0.1', '[::1]']) {
      origins.add(`${protocol}//${host}${port ? `:${port}` : ''}`);
      origins.add(`http://${host}:8081`);
    }
  }
  return [...origins];
}
