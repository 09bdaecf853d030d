import { openDatabase } from './db.js';
import { seedDemo } from '../seed/seed.js';
const db = await openDatabase();
const { created } = await seedDemo(db);
console.log(created ? `Demo scenario written (${created} rows).` : 'Demo scenario already present.');
await db.destroy();
//# sourceMappingURL=seed.js.map