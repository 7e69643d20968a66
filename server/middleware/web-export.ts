import path from 'node:path';
import express, { Router } from 'express';

// Everything Expo writes under these folders carries a content hash in its file name (scripts under
// /_expo/static, fonts and images under /assets), so a new build never reuses a URL: browsers may keep
// them for a year without asking again.
const HASHED = /^\/(_expo\/static|assets)\//;
const IMMUTABLE = 'public, max-age=31536000, immutable';
// index.html names the current script, so it must be revalidated on every visit or a phone would keep
// running last month's build. favicon.ico and metadata.json have fixed names: a short cache.
const REVALIDATE = 'no-cache';
const SHORT = 'public, max-age=3600';

/** Serves the single-page web export: hashed files for a year, every unknown path gets index.html. */
export function webExport(webDir: string): Router {
  const root = path.resolve(webDir);
  const indexFile = path.join(root, 'index.html');
  const router = Router();
  router.use(
    express.static(root, {
      index: false,
      setHeaders: (res, filePath) => {
        const urlPath = `/${path.relative(root, filePath).split(path.sep).join('/')}`;
        if (HASHED.test(urlPath)) res.setHeader('Cache-Control', IMMUTABLE);
        else if (filePath === indexFile) res.setHeader('Cache-Control', REVALIDATE);
        else res.setHeader('Cache-Control', SHORT);
      },
    }),
  );
  // The router takes over in the browser for every other path, deep links included.
  router.get('/{*splat}', (_req, res) => {
    res.sendFile(indexFile, { headers: { 'Cache-Control': REVALIDATE } });
  });
  return router;
}
