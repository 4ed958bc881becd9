/**
 * createApp builds the Express app from its dependencies and never listens, so supertest can drive it.
 * server/index.ts owns the process: database, listen, shutdown.
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppContext } from './context.ts';
import { scrubRequest } from './log-redaction.ts';
import { errorHandler } from './middleware/error-handler.ts';
import { serveClient } from './client-static.ts';
import { authKit } from './auth/kit.ts';
import { apiRouter } from './routes/index.ts';
import { forgetReadAccessAfterWrites } from './services/read-access-cache.ts';

export interface AppOptions {
  /** Folder of the built client to serve with an index.html fallback; omitted in API-only tests. */
  clientDir?: string;
}

export function createApp(ctx: AppContext, options: AppOptions = {}): Express {
  const app = express();
  app.disable('x-powered-by');
  if (ctx.config.TRUST_PROXY) app.set('trust proxy', 1);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // ant-design-vue and AG Grid set inline styles; scripts stay same-origin only.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'", 'blob:'],
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.use(pinoHttp({ logger: ctx.log, serializers: { req: scrubRequest }, autoLogging: { ignore: (req) => req.url === '/api/health' } }));
  app.use(express.json({ limit: ctx.config.BODY_LIMIT }));
  app.use('/api', forgetReadAccessAfterWrites(ctx));
  // Session, passport, API tokens and CSRF, before any API route.
  app.use('/api', authKit(ctx).middleware);
  app.use('/api', apiRouter(ctx));

  const clientDir = options.clientDir;
  if (clientDir && existsSync(path.join(clientDir, 'index.html'))) {
    serveClient(app, clientDir);
  }
  app.use(errorHandler(ctx.log));
  return app;
}
