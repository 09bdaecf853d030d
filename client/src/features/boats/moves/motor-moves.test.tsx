import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { getRecord, listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { isLocalWriteError } from '@/db/write-error';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { testPerson } from '@/test/test-person';
import { boatFields, motorFields } from '../testing/records';
import { saveMotor } from './save-motor';

async function fleet(p: ReturnType<typeof testPerson>) {
  const from = await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 2', name: 'Gannet' }));
  const to = await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 3', name: 'Tern' }));
  const motorId = await createRecord(p.seed, 'motor', motorFields({ boatId: from }));
  return { from, to, motorId };
}

describe('moving a motor between boats', () => {
  it('records the move with who and why, and the motor page lists it', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('supervisor');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const { from, to, motorId } = await fleet(p);
    const user = userEvent.setup();
    const view = renderApp(`/fleet/motors/${motorId}`, p.session);
    expect(await screen.findByText('No moves recorded for this motor.')).toBeInTheDocument();
    expect(screen.queryByLabelText(/Why is it moving/)).toBeNull();

    await user.click(screen.getByRole('combobox', { name: 'Fitted to' }));
    await user.click(await screen.findByRole('option', { name: 'IRB 3 · Tern' }));
    await user.type(screen.getByLabelText(/Why is it moving/), 'Stand-in while the Tern motor is serviced');
    await user.click(screen.getByRole('button', { name: 'Save motor' }));
    await waitFor(() => expect(view.router.state.location.pathname).toBe('/fleet'));

    expect((await getRecord(p.ctx.db, p.ctx.clubId, 'motor', motorId))!.fields.boatId).toBe(to);
    const moves = await listRecords(p.ctx.db, p.ctx.clubId, 'motorMove');
    expect(moves.map((m) => m.fields)).toEqual([
      { motorId, fromBoatId: from, toBoatId: to, movedAt: expect.any(String), movedBy: p.ctx.userId, reason: 'Stand-in while the Tern motor is serviced' },
    ]);

    await view.router.navigate(`/fleet/motors/${motorId}`);
    const history = within(await screen.findByRole('list', { name: 'Moves between boats' }));
    // The list shows as soon as the moves are read; boat names fill in when the boats are.
    expect(await history.findByText('From IRB 2 Gannet to IRB 3 Tern')).toBeInTheDocument();
    expect(await history.findByText(/by you · Stand-in while the Tern motor is serviced · not sent yet/)).toBeInTheDocument();
  }, 30_000);

  it('lists moves newest first, to and from the store', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const { from, motorId } = await fleet(p);
    const move = (fromBoatId: string | null, toBoatId: string | null, movedAt: string) =>
      createRecord(p.seed, 'motorMove', { motorId, fromBoatId, toBoatId, movedAt, movedBy: 'u-someone', reason: '' });
    await move(from, null, '2026-10-01T01:00:00Z');
    await move(null, from, '2026-10-20T01:00:00Z');
    renderApp(`/fleet/motors/${motorId}`, p.session);
    const history = within(await screen.findByRole('list', { name: 'Moves between boats' }));
    // The club is in Australia/Sydney (IANA tz 2026c, checks.md): DST starts 2026-10-03T16:00Z, so
    // 01:00Z reads 11:00 on 1 October (+10) and 12:00 on 20 October (+11).
    expect(history.getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'From the store to IRB 2 Gannet2026-10-20 12:00 · by a club member · not sent yet',
      'From IRB 2 Gannet to the store2026-10-01 11:00 · by a club member · not sent yet',
    ]);
  });

  it('keeps the motor where it was when its move cannot be saved', async () => {
    const p = testPerson('supervisor');
    const { from, to, motorId } = await fleet(p);
    const motor = (await getRecord(p.ctx.db, p.ctx.clubId, 'motor', motorId))!;
    const error = await saveMotor(p.ctx, { motorId, fields: { ...motor.fields, boatId: to }, fittedTo: from, reason: 'x'.repeat(501) }).catch((e) => e);
    expect(isLocalWriteError(error)).toBe(true);
    expect((await getRecord(p.ctx.db, p.ctx.clubId, 'motor', motorId))!.fields.boatId).toBe(from);
    expect(await listRecords(p.ctx.db, p.ctx.clubId, 'motorMove')).toEqual([]);
    expect(await p.ctx.db.outbox.where('recordId').equals(motorId).count()).toBe(1);
  });
});
