// The migrations must build exactly the schema the entities describe: a record kind that gains a
// field without a migration would lose that field on every push.
import { createTestApp, type TestApp } from './support/test-app.js';

describe('migrations and entities', () => {
  let t: TestApp;
  beforeAll(async () => { t = await createTestApp(); });
  afterAll(async () => { await t?.app.close(); });

  it('leave nothing for the schema builder to change', async () => {
    const pending = await t.db.driver.createSchemaBuilder().log();
    const statements = pending.upQueries.map((q) => q.query);
    expect(statements).toEqual([]);
  });
});
