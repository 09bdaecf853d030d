import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';
import { ErrorFilter } from './common/error.filter.js';
import { appValidationPipe } from './common/validation.js';
/** Everything main.ts and the e2e tests share, so tests run the app as it is served. */
export function configureApp(app, env) {
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
    // Push bodies may arrive gzip-encoded; the limit applies to the inflated JSON.
    app.useBodyParser('json', { limit: `${env.REQUEST_BODY_LIMIT_MB}mb`, inflate: true });
    app.setGlobalPrefix('api');
    app.useGlobalFilters(new ErrorFilter(env.REQUEST_BODY_LIMIT_MB));
    app.useGlobalPipes(appValidationPipe());
    const doc = new DocumentBuilder().setTitle('Breakline API').setVersion('1').addBearerAuth().build();
    SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, doc));
    if (env.CLIENT_DIST)
        serveClient(app, env.CLIENT_DIST);
}
/** Serves the built PWA; unknown non-API paths get index.html so client routes deep-link. */
function serveClient(app, dir) {
    const index = join(dir, 'index.html');
    if (!existsSync(index))
        throw new Error(`CLIENT_DIST is ${dir} but it holds no index.html; build the client first (npm run build).`);
    app.useStaticAssets(dir, {
        index: false,
        setHeaders: (res, path) => {
            const immutable = path.includes(`${join(dir, 'assets')}`);
            res.setHeader('Cache-Control', immutable ? 'public, max-age=31536000, immutable' : 'no-cache');
        },
    });
    app.use((req, res, next) => {
        if (req.method !== 'GET' || req.path.startsWith('/api'))
            return next();
        res.setHeader('Cache-Control', 'no-cache');
        res.sendFile(index);
    });
}
//# sourceMappingURL=app.setup.js.map