import { openDatabase } from './db.js';
const db = await openDatabase();
const done = await db.runMigrations({ transaction: 'each' });
console.log(done.length ? `Applied ${done.length} migration(s): ${done.map((m) => m.name).join(', ')}` : 'Database schema is up to date.');
await db.destroy();
//# sourceMappingURL=migrate.js.map