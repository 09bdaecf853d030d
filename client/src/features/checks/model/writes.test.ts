import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { getRecord, listRecords } from '@/db/queries';
import { isLocalWriteError } from '@/db/write-error';
import { FakeBackend } from '@/sync/test/fake-backend';
import { testDevice } from '@/sync/test/device';
import { seedBoatAndTemplates } from '../testing/boat';
import { finishCheck, saveAnswer, startCheck } from './writes';

async function openCheck() {
  const phone = testDevice(new FakeBackend(), 'member-ana', 'crew');
  // The boat and templates come from an admin, as a club's do; the check is crew's.
  const boatId = await seedBoatAndTemplates({ ...phone.writer, userId: 'member-kim', role: 'admin' });
  const template = (await listRecords(phone.db, phone.scope.clubId, 'checkTemplate')).find((t) => t.fields.checkType === 'launch')!;
  const checkId = await startCheck(phone.writer, boatId, null, template);
  const stored = async () => (await getRecord(phone.db, phone.scope.clubId, 'check', checkId))!;
  const queued = async () => (await phone.db.outbox.where('recordId').equals(checkId).sortBy('seq')).map((e) => e.mutation);
  return { phone, checkId, stored, queued };
}

const [first, second, third] = DEFAULT_LAUNCH_TEMPLATE.sections[0]!.items.map((i) => i.id);

describe('saving answers', () => {
  it('keeps every answer of quick taps, each its own queued change based on the one before', async () => {
    const { phone, checkId, stored, queued } = await openCheck();
    // Three taps before the first is saved.
    await Promise.all([
      saveAnswer(phone.writer, checkId, first!, { outcome: 'pass' }),
      saveAnswer(phone.writer, checkId, second!, { outcome: 'na' }),
      saveAnswer(phone.writer, checkId, first!, { outcome: 'fail', note: 'Seam lifting at the transom' }),
    ]);
    expect((await stored()).fields.results).toEqual({
      [first!]: { outcome: 'fail', note: 'Seam lifting at the transom' },
      [second!]: { outcome: 'na' },
    });
    const [, ...answers] = await queued();
    expect(answers.map((m) => Object.keys(m.patch.results as object))).toEqual([[first], [first, second], [first, second]]);
    // The third tap's base is what the screen showed after the first two.
    expect(answers[2]!.base).toEqual({ results: { [first!]: { outcome: 'pass' }, [second!]: { outcome: 'na' } } });
    expect((await stored()).waiting).toBe(4);
  });

  it('finishes after the answers tapped before it', async () => {
    const { phone, checkId, stored, queued } = await openCheck();
    const answer = saveAnswer(phone.writer, checkId, third!, { outcome: 'pass' });
    await finishCheck(phone.writer, checkId, new Date('2026-12-01T09:30:00Z'));
    await answer;
    expect((await stored()).fields).toMatchObject({ status: 'complete', results: { [third!]: { outcome: 'pass' } } });
    expect((await queued()).map((m) => Object.keys(m.patch).sort())).toEqual([expect.any(Array), ['results'], ['completedAt', 'status']]);
  });

  it('refuses an answer the check may not hold, with nothing queued', async () => {
    const { phone, checkId, stored, queued } = await openCheck();
    const error = await saveAnswer(phone.writer, checkId, first!, { outcome: 'fail', note: 'x'.repeat(2001) }).catch((e: unknown) => e);
    expect(isLocalWriteError(error, 'invalid')).toBe(true);
    expect((await stored()).fields.results).toEqual({});
    expect(await queued()).toHaveLength(1);
  });

  it('says to start again when the check is no longer on the phone', async () => {
    const { phone } = await openCheck();
    await expect(saveAnswer(phone.writer, '0190f1a0-0000-7000-8000-0000000c0fff', first!, { outcome: 'pass' })).rejects.toMatchObject({
      code: 'not-found',
      message: 'This check is not on this phone any more; start it again from Checks.',
    });
  });
});
