import path from 'node:path';
import express, { Router } from 'express';

/** Serves the built client; any other GET outside /api and /auth gets index.html (history routing). */
export function serveWebClient(webDir: string): Router {
  const router = Router();
  router.use(express.static(webDir, { index: false, maxAge: '1h' }));
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/') || req.path.startsWith('/auth/')) return next();
    res.sendFile(path.join(webDir, 'index.html'));
  });
  return router;
}
