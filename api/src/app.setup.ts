import { existsSync } from 'node:fs';
import { extname, join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import express, { type NextFunction, type Request, type Response } from 'express';
import helmet from 'helmet';
import type { Config } from './config.js';
import { ErrorFilter, parserError } from './common/error.filter.js';
import { validationPipe } from './common/validation.js';

/** Large enough for a push of 500 sampled parts; photos go through multer with their own limit. */
const JSON_LIMIT = '2mb';

const NO_CACHE = new Set(['index.html', 'sw.js']);

/** Everything about the HTTP side that main and the e2e tests share. */
export function configureApp(app: NestExpressApplication, config: Config): INestApplication {
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Photos are previewed from blobs; icons come as data: URLs.
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'", 'data:'],
          // The plant server is often plain http on the LAN: upgrading would break every request.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  if (config.corsOrigins.length > 0) {
    app.enableCors({ origin: config.corsOrigins, maxAge: 600 });
  }
  app.use('/api', express.json({ limit: JSON_LIMIT }));
  app.use('/api', (error: unknown, _req: Request, res: Response, next: NextFunction) => {
    const known = parserError(error);
    if (known) res.status(known.statusCode).json(known);
    else next(error);
  });
  app.setGlobalPrefix('api');
  app.useGlobalPipes(validationPipe);
  app.useGlobalFilters(new ErrorFilter());
  servePwa(app, config.pwaDir);
  return app;
}

/**
 * The built PWA at `/`, with index.html for any other page path (client-side routes) but never
 * for /api or for a missing asset. The service worker and the page must not be cached by the
 * browser, or an update would never be seen.
 */
function servePwa(app: NestExpressApplication, dir: string): void {
  const index = join(dir, 'index.html');
  if (!existsSync(index)) return;
  const setHeaders = (res: Response, path: string) => {
    if (NO_CACHE.has(path.split(/[\\/]/).pop() ?? '')) res.setHeader('Cache-Control', 'no-cache');
  };
  app.use(express.static(dir, { index: false, setHeaders }));
  app.use((req: Request, res: Response, next: NextFunction) => {
    const isPage = (req.method === 'GET' || req.method === 'HEAD') && extname(req.path) === '';
    if (!isPage || req.path === '/api' || req.path.startsWith('/api/')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
