import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin, bearer } from 'better-auth/plugins';
import { createAccessControl } from 'better-auth/plugins/access';
import { adminAc, defaultStatements } from 'better-auth/plugins/admin/access';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../shared/schemas/auth';
import type { Db } from './db/client';
import * as schema from './db/schema';
import type { Env } from './env';
import { sendInBackground, type Mailer } from './lib/mailer';
import { passwordResetMail } from './lib/mail-templates';
import { trustedOrigins } from './lib/origins';
import { rememberSessionDatabase } from './middleware/session-cache';

const ac = createAccessControl(defaultStatements);
const noUserAdministration = ac.newRole({ user: [], session: [] });

export interface AuthDeps {
  db: Db;
  env: Pick<Env, 'AUTH_SECRET' | 'PUBLIC_URL' | 'NODE_ENV'>;
  mailer: Mailer;
}

/**
 * Sign-in, sessions and roles through better-auth. Public sign-up creates a clinician
 * (the admin plugin's default role); musicians and teachers are created by invitation
 * (server/services/invitation.service.ts), admins only from the server side.
 */
export function createAuth({ db, env, mailer }: AuthDeps) {
  const auth = betterAuth({
    appName: 'Ritorno',
    baseURL: env.PUBLIC_URL,
    basePath: '/api/auth',
    secret: env.AUTH_SECRET,
    trustedOrigins: trustedOrigins(env),
    database: drizzleAdapter(db, {
      provider: 'sqlite',
      schema: { user: schema.user, session: schema.session, account: schema.account, verification: schema.verification },
    }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: PASSWORD_MIN_LENGTH,
      maxPasswordLength: PASSWORD_MAX_LENGTH,
      revokeSessionsOnPasswordReset: true,
      resetPasswordTokenExpiresIn: 60 * 60,
      sendResetPassword: async ({ user, token }) => {
        const link = `${env.PUBLIC_URL}/reset-password?token=${encodeURIComponent(token)}`;
        sendInBackground(mailer, passwordResetMail({ to: user.email, name: user.name, link }));
      },
    },
    logger: { disabled: env.NODE_ENV === 'test' },
    rateLimit: { enabled: env.NODE_ENV === 'production', window: 60, max: 100 },
    plugins: [
      admin({
        ac,
        roles: { admin: adminAc, clinician: noUserAdministration, musician: noUserAdministration, teacher: noUserAdministration },
        defaultRole: 'clinician',
        adminRoles: ['admin'],
      }),
      bearer(),
    ],
  });
  rememberSessionDatabase(auth, db);
  return auth;
}

export type Auth = ReturnType<typeof createAuth>;
