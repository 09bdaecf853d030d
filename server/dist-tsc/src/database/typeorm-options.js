import { ENTITIES } from './entities.js';
import { MIGRATIONS } from '../migrations/index.js';
/** One place for connection options: the schema comes from migrations, never synchronize. */
export function typeormOptions(url) {
    return {
        type: 'postgres',
        url,
        entities: ENTITIES,
        migrations: MIGRATIONS,
        migrationsTableName: 'schema_migrations',
        synchronize: false,
        // gen_random_uuid() is built into PostgreSQL 13+; no extension to install.
        uuidExtension: 'pgcrypto',
        installExtensions: false,
        logging: ['error'],
        extra: { max: 20, connectionTimeoutMillis: 5000 },
    };
}
//# sourceMappingURL=typeorm-options.js.map