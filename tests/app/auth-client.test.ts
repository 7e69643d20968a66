import { ApiError } from '@/lib/api-client';
import { authClient } from '@/lib/auth-client';
import { mockApi } from './test-utils';

afterEach(() => jest.restoreAllMocks());

describe('authClient', () => {
  it('gives null when better-auth answers a signed-out visitor with 200 and null', async () => {
    mockApi({ 'GET /api/auth/get-session': { status: 200, body: null } });
    await expect(authClient.getSession()).resolves.toBeNull();
  });

  it('gives the session when a cookie is signed in', async () => {
    mockApi({ 'GET /api/auth/get-session': { status: 200, body: { session: { id: 's1' }, user: { id: 'u1', email: 'a@b.example' } } } });
    await expect(authClient.getSession()).resolves.toEqual({ user: { id: 'u1' } });
  });

  it('refuses a session answer of the wrong shape as a bad response', async () => {
    mockApi({ 'GET /api/auth/get-session': { status: 200, body: { user: 'u1' } } });
    await expect(authClient.getSession()).rejects.toMatchObject({ code: 'bad_response' });
  });

  it('posts an empty JSON object to sign out and to end every session', async () => {
    const calls = mockApi({ 'POST /api/auth/sign-out': { status: 200, body: { success: true } }, 'POST /api/auth/revoke-sessions': { status: 200, body: { status: true } } });
    await authClient.signOut('x');
    await authClient.revokeSessions('x');
    expect(calls).toEqual([
      { method: 'POST', path: '/api/auth/sign-out', body: {} },
      { method: 'POST', path: '/api/auth/revoke-sessions', body: {} },
    ]);
  });

  it('turns a refusal into an ApiError with better-auth code and message', async () => {
    mockApi({ 'POST /api/auth/reset-password': { status: 400, body: { code: 'INVALID_TOKEN', message: 'Invalid token' } } });
    const error = await authClient.resetPassword({ newPassword: 'long-enough-1', token: 'bad' }, 'fallback').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'INVALID_TOKEN', message: 'Invalid token' });
  });

  it('reports a network failure in words a person can act on', async () => {
    jest.spyOn(global, 'fetch').mockRejectedValue(new TypeError('Failed to fetch'));
    await expect(authClient.signUpEmail({ name: 'A', email: 'a@b.example', password: 'long-enough-1' }, 'x')).rejects.toMatchObject({ status: 0, code: 'network' });
  });
});
