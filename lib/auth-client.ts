import { z } from 'zod';
import { ApiError, apiBaseUrl, readJson } from './api-client';

/**
 * The few better-auth endpoints the app calls (the server keeps better-auth, server/auth.ts), spoken to
 * with plain fetch. better-auth's own client brought about 60 KB of JavaScript (its fetch layer, a store
 * library and its core) to every first visit for seven POSTs and one GET. Sessions ride on cookies.
 */
const AUTH_PATH = '/api/auth';

// better-auth answers a refusal with `{ code, message }`; a rate-limited request may carry no body.
const AuthErrorBodySchema = z.object({ code: z.string().optional(), message: z.string().optional() });

// Only the account's existence matters to the app; /api/me gives the rest in our own contract.
const SessionSchema = z.object({ user: z.object({ id: z.string() }) }).nullable();
export type AuthSession = z.infer<typeof SessionSchema>;

interface CallOptions {
  method?: 'GET' | 'POST';
  body?: unknown;
  signal?: AbortSignal;
  keepalive?: boolean;
}

/** One call to better-auth: a refusal becomes an ApiError carrying its code and message, or `fallback`. */
async function call(path: string, fallback: string, options: CallOptions = {}): Promise<unknown> {
  const method = options.method ?? 'POST';
  let response: Response;
  try {
    response = await fetch(`${apiBaseUrl()}${AUTH_PATH}${path}`, {
      method,
      credentials: 'include',
      headers: method === 'POST' ? { Accept: 'application/json', 'Content-Type': 'application/json' } : { Accept: 'application/json' },
      body: method === 'POST' ? JSON.stringify(options.body ?? {}) : undefined,
      signal: options.signal,
      keepalive: options.keepalive,
    });
  } catch (error) {
    if (options.signal?.aborted) throw error;
    throw new ApiError(0, 'network', 'We could not reach Ritorno. Check your connection and try again.');
  }
  const json = await readJson(response);
  if (!response.ok) {
    const parsed = AuthErrorBodySchema.safeParse(json);
    const body = parsed.success ? parsed.data : {};
    throw new ApiError(response.status, body.code ?? 'auth_error', body.message || fallback);
  }
  return json;
}

export const authClient = {
  /** The current session, or null when nobody is signed in (better-auth answers 200 with `null`). */
  async getSession({ signal }: { signal?: AbortSignal } = {}): Promise<AuthSession> {
    const json = await call('/get-session', 'We could not check whether you are signed in.', { method: 'GET', signal });
    const parsed = SessionSchema.safeParse(json);
    if (!parsed.success) throw new ApiError(200, 'bad_response', 'The server sent data this version of the app does not understand.');
    return parsed.data;
  },
  // keepalive: the sign-in still completes (and sets its cookie) if the page is left while it runs.
  async signInEmail(input: { email: string; password: string }, fallback: string): Promise<void> {
    await call('/sign-in/email', fallback, { body: input, keepalive: true });
  },
  async signUpEmail(input: { name: string; email: string; password: string }, fallback: string): Promise<void> {
    await call('/sign-up/email', fallback, { body: input });
  },
  async signOut(fallback: string): Promise<void> {
    await call('/sign-out', fallback);
  },
  /** Ends every session of the account, this one included. */
  async revokeSessions(fallback: string): Promise<void> {
    await call('/revoke-sessions', fallback);
  },
  async requestPasswordReset(input: { email: string; redirectTo: string }, fallback: string): Promise<void> {
    await call('/request-password-reset', fallback, { body: input });
  },
  async resetPassword(input: { newPassword: string; token: string }, fallback: string): Promise<void> {
    await call('/reset-password', fallback, { body: input });
  },
};
