import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { typeormOptions } from '../database/typeorm-options.js';
/** Opens a data source for a command-line task, with a sentence if the database is unreachable. */
export async function openDatabase() {
    const url = process.env.DATABASE_URL;
    if (!url) {
        console.error('Set DATABASE_URL to a postgres:// connection string (npm start does this for you).');
        process.exit(1);
    }
    try {
        return await new DataSource(typeormOptions(url)).initialize();
    }
    catch (e) {
        console.error(`Could not connect to the database: ${e.message}. Check DATABASE_URL and that PostgreSQL is running.`);
        process.exit(1);
    }
}
//# sourceMappingURL=db.js.map