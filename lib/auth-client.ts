import { createAuthClient } from 'better-auth/react';
import { adminClient } from 'better-auth/client/plugins';
import { apiBaseUrl } from './api-client';

/** better-auth's client for sign-in, sign-up, sign-out and password reset; sessions ride on cookies. */
export const authClient = createAuthClient({
  baseURL: apiBaseUrl(),
  basePath: '/api/auth',
  plugins: [adminClient()],
});
