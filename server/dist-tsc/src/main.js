import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import { ConfigError, validateEnv } from './config/env.js';
async function bootstrap() {
    const env = validateEnv(process.env);
    const logger = env.NODE_ENV === 'development' ? undefined : ['error', 'warn'];
    const app = await NestFactory.create(AppModule, { abortOnError: false, ...(logger ? { logger: [...logger] } : {}) });
    configureApp(app, env);
    app.enableShutdownHooks();
    await app.listen(env.PORT, env.HOST);
    console.log(`Breakline server listening on http://${env.HOST}:${env.PORT}`);
}
bootstrap().catch((err) => {
    if (err instanceof ConfigError)
        console.error(err.message);
    else if (err.code === 'EADDRINUSE')
        console.error(`Port ${process.env.PORT ?? 3000} is already in use. Stop the program using it or set PORT to another port.`);
    else if (err.code === 'ECONNREFUSED')
        console.error('The database refused the connection. Check DATABASE_URL and that PostgreSQL is running.');
    else
        console.error(`The server could not start: ${err.message}`);
    process.exit(1);
});
//# sourceMappingURL=main.js.map