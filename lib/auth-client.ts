import { createAuthClient } from 'better-auth/react';
import { apiBaseUrl } from './api-client';

/**
 * better-auth's client for sign-in, sign-up, sign-out and password reset; sessions ride on cookies.
 * No client plugins: administration goes through our own /api/admin routes, and importing one from
 * `better-auth/client/plugins` brings every plugin's client into the web bundle.
 */
export const authClient = createAuthClient({
  baseURL: apiBaseUrl(),
  basePath: '/api/auth',
});
