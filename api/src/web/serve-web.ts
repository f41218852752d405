import path from 'node:path';
import express, { type Router } from 'express';

/**
 * Serves the built Angular app. Hashed bundles are cached for a year (their names change with
 * their content); index.html is never cached, so a deployment reaches users on the next load.
 * Any non-API path that is not a file gets index.html, and Angular's router takes over.
 */
export function serveWeb(webDist: string): Router {
  const router = express.Router();
  const root = path.resolve(webDist);
  const index = path.join(root, 'index.html');
  const noCache = 'no-cache, no-store, must-revalidate';
  router.use(
    express.static(root, {
      index: false,
      setHeaders(res, filePath) {
        if (filePath.endsWith('.html')) res.setHeader('Cache-Control', noCache);
        // Angular's output hashing puts 16 hex-ish characters before the extension.
        else if (/-[A-Z0-9]{8,}\.(js|css|woff2?)$/i.test(filePath)) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        }
      },
    }),
  );
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/') || req.path === '/api') {
      next();
      return;
    }
    res.setHeader('Cache-Control', noCache);
    res.sendFile(index, (err) => {
      if (err) next(err);
    });
  });
  return router;
}
