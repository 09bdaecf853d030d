import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MemberAward } from '@breakline/sync-protocol';
import { getRecord } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { DESKTOP_WIDTH, setViewportWidth } from '@/test/viewport';

const SLOW = { timeout: 30_000 };
const award = (name: string, expiresOn: string | null, qualifies: 'driver' | 'crew' = 'crew'): MemberAward =>
  ({ id: name.toLowerCase().replace(/\W+/g, '-'), name, qualifies, awardedOn: '2025-01-10', expiresOn });

afterEach(() => vi.useRealTimers());

/** Invented members; "today" at the club is fixed at 6 Dec 2026 (01:00Z is 12:00 in Sydney). */
async function openAwards(role: 'supervisor' | 'admin' = 'supervisor') {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date('2026-12-06T01:00:00Z'));
  setViewportWidth(DESKTOP_WIDTH);
  const p = testPerson(role);
  const card = (displayName: string, awards: MemberAward[]) => createRecord(p.seed, 'member', { memberId: `u-${displayName}`, displayName, awards });
  const ids = {
    lapsing: await card('Priya Lindholm', [award('IRB Driver', '2026-12-20', 'driver')]),
    expired: await card('Sam Whitcombe', [award('IRB Crew', '2026-11-30')]),
    current: await card('Tomas Varga', [award('IRB Crew', '2027-06-30')]),
    none: await card('Kai Ng', []),
  };
  mockApi({ 'GET /api/auth/me': p.me });
  renderApp('/crew-awards', p.session);
  const table = within(await screen.findByRole('table', { name: 'Crew awards' }, SLOW));
  return { p, ids, table, user: userEvent.setup({ advanceTimers: () => {} }) };
}

describe('Crew awards', { timeout: 90_000 }, () => {
  it('lists awards worst first with their state on the club\'s date, and warns 30 days ahead', async () => {
    const { table } = await openAwards();
    const rows = table.getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').slice(0, 7).map((c) => c.textContent));
    // Lapsing within 30 days of expiry, valid through the expiry date itself: the rule of the brief
    // (warnings 30 days before an award lapses), as sync-protocol's awardStatusOn computes it.
    expect(rows).toEqual([
      ['Sam Whitcombe', 'IRB Crew', 'Crew', '10 Jan 2025', '30 Nov 2026', 'Expired', 'neither'],
      ['Priya Lindholm', 'IRB Driver', 'Driver (and crew)', '10 Jan 2025', '20 Dec 2026', 'Lapsing: 14 days left', 'driver and crew'],
      ['Kai Ng', '—', '—', '—', '—', 'No award recorded', 'neither'],
      ['Tomas Varga', 'IRB Crew', 'Crew', '10 Jan 2025', '30 June 2027', 'Current', 'crew'],
    ]);
    expect(screen.getByText(/1 award has expired; 1 lapses within 30 days\./)).toBeInTheDocument();
  });

  it('renews an award on the member card, saved on this computer for the next sync', async () => {
    const { p, ids, table, user } = await openAwards();
    await user.click(table.getByRole('button', { name: 'Edit the awards of Sam Whitcombe' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Awards of Sam Whitcombe' }));
    const expires = dialog.getByLabelText('Expires on');
    await user.clear(expires);
    await user.type(expires, '2027-11-30');
    await user.click(dialog.getByRole('button', { name: 'Save awards' }));
    await waitFor(async () => expect((await getRecord(p.ctx.db, p.ctx.clubId, 'member', ids.expired))!.fields.awards).toEqual([award('IRB Crew', '2027-11-30')]));
    await waitFor(() => expect(table.getAllByRole('row')[1]).toHaveTextContent('Priya Lindholm'));
  });

  it('refuses an award without a name and says what to write', async () => {
    const { table, user } = await openAwards();
    await user.click(table.getByRole('button', { name: 'Edit the awards of Kai Ng' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Awards of Kai Ng' }));
    await user.click(dialog.getByRole('button', { name: 'Add an award' }));
    await user.click(dialog.getByRole('button', { name: 'Save awards' }));
    expect(dialog.getByText("Award 1 needs a name, such as the award's title on the certificate.")).toBeInTheDocument();
  });

  it('tells a driver the list is for supervisors', async () => {
    setViewportWidth(DESKTOP_WIDTH);
    const p = testPerson('driver');
    mockApi({ 'GET /api/auth/me': p.me });
    renderApp('/crew-awards', p.session);
    expect(await screen.findByText('Not open to your role', {}, SLOW)).toBeInTheDocument();
  });
});
