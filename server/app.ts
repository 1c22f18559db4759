import fs from 'node:fs';
import type { ServerResponse } from 'node:http';
import path from 'node:path';

import express from 'express';
import session from 'express-session';
import expressStaticGzip from 'express-static-gzip';
import helmet from 'helmet';

import { passport } from './auth/passport';
import { createSessionStore } from './auth/session-store';
import { config } from './config';
import { requireSameOrigin } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { limitJsonDepth } from './middleware/json-depth';
import { endStaleSessions } from './middleware/session-lifetime';
import { apiRouters } from './routes';

// Hashed bundle files never change under their name; the page and the worker are revalidated.
function cacheControlFor(webDir: string, file: string) {
  const relative = path.relative(webDir, file).split(path.sep).join('/');
  return relative.startsWith('_expo/static/') || relative.startsWith('assets/') ? 'public, max-age=31536000, immutable' : 'no-cache';
}

export function createApp(options: { webDir?: string } = {}) {
  const app = express();
  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web writes style tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
        },
      },
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(limitJsonDepth);

  app.use(
    '/api',
    session({
      name: 'sightline.sid',
      secret: config.sessionSecret,
      store: createSessionStore(),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        // Secure whenever the request arrived over HTTPS (directly or via a trusted proxy).
        secure: 'auto',
        maxAge: config.sessionMaxAgeHours * 3_600_000,
      },
    }),
    passport.initialize(),
    passport.session(),
    endStaleSessions,
    requireSameOrigin,
  );

  for (const { prefix, router } of apiRouters) app.use(prefix, router);
  app.use('/api', notFoundHandler);

  const webDir = options.webDir ?? path.resolve(__dirname, '..', 'dist');
  if (fs.existsSync(path.join(webDir, 'index.html'))) {
    // Pre-compressed copies (scripts/compress-web.js) go to browsers that accept them.
    // The list of .br/.gz files is read once here: restart after a rebuild.
    const setHeaders = (res: ServerResponse, file: string) => res.setHeader('Cache-Control', cacheControlFor(webDir, file));
    app.use(
      expressStaticGzip(webDir, {
        index: false,
        enableBrotli: true,
        orderPreference: ['br', 'gzip'],
        serveStatic: { index: false, setHeaders },
      }),
    );
    // A missing bundle chunk or worker must be a 404, never index.html: a stale page would
    // otherwise load HTML as script and the service worker would fail to register.
    app.get(['/_expo/{*rest}', '/assets/{*rest}', '/sw.js'], (_req, res) => res.status(404).type('text/plain').send('Not found'));
    // Single-page app: every other path is a client route.
    app.get('/{*splat}', (_req, res) => res.setHeader('Cache-Control', 'no-cache').sendFile(path.join(webDir, 'index.html')));
  }

  app.use(errorHandler);
  return app;
}
