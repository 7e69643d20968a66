import { toNodeHandler } from 'better-auth/node';
import compression from 'compression';
import express from 'express';
import helmet from 'helmet';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { trustedOrigins } from './lib/origins';
import { sameOriginWrites } from './middleware/same-origin';
import { signInLimit } from './middleware/sign-in-limit';
import { readSession } from './middleware/session-cache';
import { accountOf } from './middleware/auth';
import { isWebExport, webExport } from './middleware/web-export';
import { answerFirstReads } from './services/first-reads.service';
import { adminRoutes } from './routes/admin.routes';
import { calendarRoutes } from './routes/calendar.routes';
import { checkInRoutes } from './routes/check-ins.routes';
import type { AppDeps } from './routes/deps';
import { invitationRoutes } from './routes/invitations.routes';
import { meRoutes } from './routes/me.routes';
import { myDocumentRoutes } from './routes/my-documents.routes';
import { myPlanRoutes } from './routes/my-plan.routes';
import { musicianRoutes } from './routes/musicians.routes';
import { planPresetRoutes } from './routes/plan-presets.routes';
import { musicianShareRoutes, shareRoutes } from './routes/shares.routes';
import { studentRoutes } from './routes/students.routes';
import { summaryRoutes } from './routes/summary.routes';
import { todayRoutes } from './routes/today.routes';

export type { AppDeps } from './routes/deps';

/** Builds the Express app; never listens (server/index.ts does). */
export function createApp(deps: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web writes style attributes at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
        },
      },
    }),
  );
  // Phones on weak connections: the script is about a quarter of its size gzipped, JSON far less.
  // Content is negotiated per request (Accept-Encoding), so calendar apps that send none still get plain
  // text; small bodies (under 1 KB) go uncompressed.
  app.use(compression());

  // better-auth reads the raw body, so it is mounted before express.json().
  app.post('/api/auth/sign-in/email', signInLimit(deps.env.SIGN_IN_LIMIT_PER_MINUTE ?? 10));
  app.all('/api/auth/{*splat}', toNodeHandler(deps.auth));
  app.use(express.json({ limit: '100kb' }));
  app.use('/api', sameOriginWrites(trustedOrigins(deps.env)));

  app.get('/api/health', (_req, res) => {
    res.json({ ok: true });
  });
  app.use('/api/me', meRoutes(deps));
  app.use('/api/today', todayRoutes(deps));
  app.use('/api/plan', myPlanRoutes(deps));
  app.use('/api/check-ins', checkInRoutes(deps));
  app.use('/api/calendar', calendarRoutes(deps));
  app.use('/api/invitations', invitationRoutes(deps));
  app.use('/api/musicians', musicianRoutes(deps));
  app.use('/api/plan-presets', planPresetRoutes(deps));
  app.use('/api/documents', myDocumentRoutes(deps));
  app.use('/api/summary', summaryRoutes(deps));
  app.use('/api/students', studentRoutes(deps));
  app.use('/api/shares', shareRoutes(deps));
  app.use('/api/musicians/:musicianId/shares', musicianShareRoutes(deps));
  app.use('/api/admin', adminRoutes(deps));
  app.use('/api', apiNotFound);

  if (deps.webDir && isWebExport(deps.webDir)) {
    app.use(
      webExport(deps.webDir, {
        visitor: async (req, pathname) => {
          const session = await readSession(deps.auth, req.headers);
          const me = session && accountOf(session);
          if (!session) return { signedIn: false };
          return { signedIn: true, reads: me ? answerFirstReads(deps.db, me, pathname, deps.now()) : undefined };
        },
      }),
    );
  }

  app.use(errorHandler);
  return app;
}
