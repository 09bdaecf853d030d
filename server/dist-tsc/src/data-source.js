// Used by the TypeORM CLI (migration:generate / migration:run).
import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { typeormOptions } from './database/typeorm-options.js';
const url = process.env.DATABASE_URL;
if (!url)
    throw new Error('Set DATABASE_URL to a postgres:// connection string to run migrations.');
export default new DataSource(typeormOptions(url));
//# sourceMappingURL=data-source.js.map