// The Express app: security headers, logs, JSON bodies, the areas' routes, the exported web
// build with a fallback to index.html for client routes, and the one error middleware.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import compression from 'compression';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { HealthResponse } from '@/shared/api/auth';
import { syncPaths } from '@/shared/api/sync';
import { areas, devAreas } from './areas';
import type { Deps } from './deps';
import { errorHandler, notFound } from './http/errors';
import { setServiceWorkerHeaders } from './web/headers';

export function createApp(deps: Deps): Express {
  const app = express();
  app.disable('x-powered-by');
  // Behind a reverse proxy req.ip (the rate limits' key) comes from X-Forwarded-For; see README.
  app.set('trust proxy', deps.config.trustProxy);
  app.use(
    helmet({
      // The Expo web export injects inline styles and scripts; a CSP would need per-build hashes.
      contentSecurityPolicy: false,
      // expo-sqlite on web needs a cross-origin isolated page (docs/stack.md).
      crossOriginOpenerPolicy: { policy: 'same-origin' },
      crossOriginEmbedderPolicy: { policy: 'require-corp' },
    }),
  );
  app.use(pinoHttp({ logger: deps.log, redact: ['req.headers.authorization', 'req.headers.cookie'] }));
  // The web bundle is ~3.6 MB; gzip makes the first load on conference wifi about 4x smaller.
  app.use(compression());
  // A push (up to 8 MB) is parsed by its route after the token is checked (server/sync/routes.ts).
  const json = express.json({ limit: deps.config.jsonLimit });
  app.use((req, res, next) => (req.path === syncPaths.push ? next() : json(req, res, next)));

  app.get('/api/health', (_req, res) => {
    res.json({ ok: true } satisfies HealthResponse);
  });
  for (const area of [...areas, ...(deps.config.devPages ? devAreas : [])]) app.use(area.routes(deps));
  app.use('/api', () => {
    throw notFound('No such API route');
  });

  const webDir = deps.config.webDir && resolve(deps.config.webDir);
  if (webDir && existsSync(join(webDir, 'index.html'))) {
    app.use(express.static(webDir, { index: false, setHeaders: setServiceWorkerHeaders }));
    // A missing build file is a 404, not index.html: a font or script answered with HTML fails
    // in confusing ways (and would be cached by the service worker as if it were the file).
    app.use(['/_expo', '/assets'], () => {
      throw notFound('No such file in the web build');
    });
    app.get('/{*splat}', (_req, res) => {
      res.sendFile(join(webDir, 'index.html'));
    });
  }
  app.use(errorHandler);
  return app;
}
