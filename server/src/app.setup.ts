import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { constants as zlibConstants } from 'node:zlib';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { NextFunction, Request, Response } from 'express';
import compression from 'compression';
import helmet from 'helmet';
import { ErrorFilter } from './common/error.filter.js';
import { appValidationPipe } from './common/validation.js';
import type { Env } from './config/env.js';

/** Everything main.ts and the e2e tests share, so tests run the app as it is served. */
export function configureApp(app: NestExpressApplication, env: Env) {
  app.set('trust proxy', 'loopback');
  app.use(helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        styleSrc: ["'self'", "'unsafe-inline'"],
        workerSrc: ["'self'"],
        connectSrc: ["'self'"],
        upgradeInsecureRequests: null,
      },
    },
  }));
  // Answers go compressed to a browser that asks: a first sync's pull pages are megabytes of
  // JSON that shrink to about a tenth, which is most of the wait on a clubhouse Wi-Fi. A push's
  // answer is a short list of results, not worth the server's time while it takes the next batch.
  // The fast settings: on a page of checks, brotli at quality 1 packs tighter than gzip's default
  // in a quarter of the time, and gzip at level 3 (for clients without brotli) costs half as much
  // as its default for about a fifth more bytes.
  app.use(compression({
    level: 3,
    brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 1 } },
    filter: (req, res) => !req.path.startsWith('/api/sync/push') && compression.filter(req, res),
  }));
  // Push bodies may arrive gzip-encoded; the limit applies to the inflated JSON.
  app.useBodyParser('json', { limit: `${env.REQUEST_BODY_LIMIT_MB}mb`, inflate: true });
  app.setGlobalPrefix('api');
  app.useGlobalFilters(new ErrorFilter(env.REQUEST_BODY_LIMIT_MB));
  app.useGlobalPipes(appValidationPipe());
  const doc = new DocumentBuilder().setTitle('Breakline API').setVersion('1').addBearerAuth().build();
  SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, doc));
  if (env.CLIENT_DIST) serveClient(app, env.CLIENT_DIST);
}

/** Serves the built PWA; unknown non-API paths get index.html so client routes deep-link. */
function serveClient(app: NestExpressApplication, dir: string) {
  const index = join(dir, 'index.html');
  if (!existsSync(index)) throw new Error(`CLIENT_DIST is ${dir} but it holds no index.html; build the client first (npm run build).`);
  app.useStaticAssets(dir, {
    index: false,
    setHeaders: (res, path) => {
      const immutable = path.includes(`${join(dir, 'assets')}`);
      res.setHeader('Cache-Control', immutable ? 'public, max-age=31536000, immutable' : 'no-cache');
    },
  });
  app.use((req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' || req.path.startsWith('/api')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
