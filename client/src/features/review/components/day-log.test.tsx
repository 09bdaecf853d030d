import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { renderApp } from '@/test/render-app';
import { atTheDesk, checkFields, lastQuery, SLOW } from '../testing/desk';

const page = (rows: unknown[]) => ({ status: 200, body: { rows, total: rows.length } });

describe("the day's log", { timeout: 90_000 }, () => {
  it("asks the server for the day's records, signs off its completed checks and closes the day", async () => {
    const ids: string[] = [];
    const p = await atTheDesk('supervisor', async ({ boatId, seed }) => {
      const a = await createRecord(seed, 'check', checkFields(boatId));
      const b = await createRecord(seed, 'check', checkFields(boatId, { checkType: 'stow', startedAt: '2026-12-06T06:00:00Z', results: {} }));
      ids.push(a, b);
      return {
        'GET /api/review/checks': page([{ id: a, ...checkFields(boatId), failedItems: 1 }, { id: b, ...checkFields(boatId, { checkType: 'stow', startedAt: '2026-12-06T06:00:00Z', results: {} }), failedItems: 0 }]),
        'GET /api/review/trips': page([{ id: 't-1', boatId, purpose: 'patrol', launchedAt: '2026-12-05T23:00:00Z', retrievedAt: '2026-12-06T00:30:00Z' }]),
        'GET /api/review/defects': page([{ id: 'd-1', boatId, severity: 'stand-down', status: 'open', description: 'Propeller guard cracked' }]),
      };
    });
    const user = userEvent.setup();
    renderApp('/review/day?date=2026-12-06', p.session);
    expect(await screen.findByRole('heading', { name: 'Sun, 6 Dec 2026' }, SLOW)).toBeInTheDocument();
    expect(lastQuery(p.api.calls, '/api/review/checks')).toMatchObject({ from: '2026-12-06', to: '2026-12-06' });
    expect(await screen.findByText('1 h 30 min on the water')).toBeInTheDocument();
    expect(screen.getByText(/stand-down defect is still open: that boat is not to be launched/)).toBeInTheDocument();
    const checks = within(screen.getByRole('table', { name: 'Checks of the day' }));
    expect(checks.getByText('1 failed: read before signing')).toBeInTheDocument();

    await user.click(await screen.findByRole('button', { name: 'Sign off all 2 completed checks' }));
    await waitFor(async () => {
      const stored = await listRecords(p.ctx.db, p.ctx.clubId, 'check');
      expect(stored.map((c) => c.fields.signedOffBy)).toEqual([p.ctx.userId, p.ctx.userId]);
    });
    await waitFor(() => expect(checks.getAllByText(/^Signed off by Ria Okafor \(you\)/)).toHaveLength(2));

    await user.click(screen.getByLabelText("Note for the day's log (optional)"));
    await user.paste('Quiet day, one boat stood down');
    await user.click(screen.getByRole('button', { name: "Sign off the day's log" }));
    await waitFor(async () => {
      const [day] = await listRecords(p.ctx.db, p.ctx.clubId, 'daySignOff');
      expect(day?.fields).toMatchObject({ sessionDate: '2026-12-06', boatId: null, signedOffBy: p.ctx.userId, note: 'Quiet day, one boat stood down' });
    });
    expect(await screen.findByText(/Whole club: signed off by/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: "Sign off the day's log" })).not.toBeInTheDocument();
  });
});
