import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { getRecord } from '@/db/queries';
import { createRecord } from '@/db/write';
import { renderApp } from '@/test/render-app';
import { atTheDesk, checkFields, lastQuery, PEOPLE, SLOW } from '../testing/desk';

const page = (rows: unknown[], total = rows.length) => ({ status: 200, body: { rows, total } });

describe('Review desk tables', { timeout: 90_000 }, () => {
  it('shows the server page of checks with names, states and the total', async () => {
    const p = await atTheDesk('supervisor', ({ boatId }) => ({
      'GET /api/review/checks': page([
        { id: 'c-a', version: 2, fields: checkFields(boatId), failedItems: 1 },
        { id: 'c-b', version: 3, fields: checkFields(boatId, { checkType: 'stow', signedOffBy: PEOPLE.captain.userId, signedOffAt: '2026-12-06T07:00:00Z' }), failedItems: 0 },
      ], 137),
    }));
    renderApp('/review', p.session);
    const grid = await screen.findByRole('grid', { name: 'Checks' }, SLOW);
    expect(await within(grid).findAllByText('Launch check')).toHaveLength(1);
    expect(within(grid).getByText('Stow check')).toBeInTheDocument();
    expect(within(grid).getAllByText(PEOPLE.crew.displayName)).toHaveLength(2);
    expect(await within(grid).findAllByText('IRB 2 Gannet')).toHaveLength(2);
    expect(within(grid).getByText('Complete, to sign off')).toBeInTheDocument();
    expect(within(grid).getByText(`Signed off by ${PEOPLE.captain.displayName}`)).toBeInTheDocument();
    expect(screen.getByText('137 checks in all')).toBeInTheDocument();
    // The first page, 50 rows, as the contract's defaults.
    expect(lastQuery(p.api.calls, '/api/review/checks')).toEqual({ page: '0', pageSize: '50' });
  });

  it('sends the filters and the sort to the server and starts again at the first page', async () => {
    const p = await atTheDesk('supervisor', () => ({ 'GET /api/review/defects': page([]) }));
    const user = userEvent.setup();
    renderApp('/review?tab=defects&page=3', p.session);
    await screen.findByRole('grid', { name: 'Defects' }, SLOW);
    expect(lastQuery(p.api.calls, '/api/review/defects')).toMatchObject({ page: '3' });

    await user.click(screen.getByRole('combobox', { name: 'Severity' }));
    await user.click(await screen.findByRole('option', { name: 'Stand-down' }));
    await waitFor(() => expect(lastQuery(p.api.calls, '/api/review/defects')).toEqual({ severity: 'stand-down', page: '0', pageSize: '50' }));

    await user.click(screen.getByRole('combobox', { name: 'Boat' }));
    await user.click(await screen.findByRole('option', { name: 'IRB 2 Gannet' }));
    await user.type(screen.getByLabelText('From'), '2026-11-01');
    await waitFor(() => expect(lastQuery(p.api.calls, '/api/review/defects')).toMatchObject({ boatId: p.boatId, from: '2026-11-01', severity: 'stand-down' }));

    await user.click(screen.getByRole('columnheader', { name: 'Reported' }));
    await waitFor(() => expect(lastQuery(p.api.calls, '/api/review/defects')).toMatchObject({ sort: 'reportedAt', dir: 'asc' }));
    expect(await screen.findByText('No defects match these filters. Widen the dates or clear a filter.')).toBeInTheDocument();
  });

  it('does not ask the server when the dates are the wrong way round, and says what to do', async () => {
    const p = await atTheDesk('supervisor', () => ({ 'GET /api/review/trips': page([]) }));
    renderApp('/review?tab=trips&from=2026-12-10&to=2026-12-01', p.session);
    expect(await screen.findByText('The "from" date is after the "to" date: swap them or clear one.', {}, SLOW)).toBeInTheDocument();
    expect(p.api.calls.some((c) => c.path.startsWith('/api/review/trips'))).toBe(false);
  });

  it('exports the filtered table as CSV through the .csv address with the same filters', async () => {
    const p = await atTheDesk('supervisor', () => ({
      'GET /api/review/trips': page([]),
      'GET /api/review/trips.csv': { status: 200, body: 'id,boat\n' },
    }));
    const saved: string[] = [];
    vi.stubGlobal('URL', Object.assign(URL, { createObjectURL: () => 'blob:csv', revokeObjectURL: () => {} }));
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) { saved.push(this.download); });
    const user = userEvent.setup();
    renderApp('/review?tab=trips&from=2026-11-01&state=afloat', p.session);
    await user.click(await screen.findByRole('button', { name: 'Export trips as CSV' }, SLOW));
    await waitFor(() => expect(lastQuery(p.api.calls, '/api/review/trips.csv')).toEqual({ from: '2026-11-01', state: 'afloat' }));
    await waitFor(() => expect(saved).toEqual(['breakline-trips-2026-11-01-to-now.csv']));
  });

  it('says in plain words when the server refuses, with a way to try again when that can help', async () => {
    const p = await atTheDesk('supervisor', () => ({
      'GET /api/review/checks': { status: 500, body: { statusCode: 500, code: 'internal_error', message: 'Something went wrong on the server. Try again; if it keeps happening, tell your club admin.' } },
    }));
    renderApp('/review', p.session);
    expect(await screen.findByText('The checks could not be loaded', {}, SLOW)).toBeInTheDocument();
    expect(screen.getByText(/Something went wrong on the server\. Try again/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('signs a completed check off on this computer and shows it before the server has it', async () => {
    let id = '';
    const p = await atTheDesk('supervisor', async ({ boatId, seed }) => {
      id = await createRecord(seed, 'check', checkFields(boatId));
      return { 'GET /api/review/checks': page([{ id, version: 1, fields: checkFields(boatId) }]) };
    });
    const user = userEvent.setup();
    renderApp('/review', p.session);
    const grid = await screen.findByRole('grid', { name: 'Checks' }, SLOW);
    await user.click(await within(grid).findByRole('button', { name: 'Sign off' }));
    await waitFor(async () => expect((await getRecord(p.ctx.db, p.ctx.clubId, 'check', id))!.fields).toMatchObject({ signedOffBy: p.ctx.userId, signedOffAt: expect.any(String) }));
    expect(await within(grid).findByText('Signed off by Ria Okafor (you) (waiting to sync)')).toBeInTheDocument();
  });

  it('explains why a check that has not reached this computer cannot be signed off yet', async () => {
    const p = await atTheDesk('supervisor', ({ boatId }) => ({
      'GET /api/review/checks': page([{ id: '0190c000-0000-7000-8000-0000000000ff', version: 1, fields: checkFields(boatId) }]),
    }));
    const user = userEvent.setup();
    renderApp('/review', p.session);
    await user.click(await within(await screen.findByRole('grid', { name: 'Checks' }, SLOW)).findByRole('button', { name: 'Sign off' }));
    expect(await screen.findByText(/has not reached this computer yet/)).toBeInTheDocument();
  });
});
