import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, memberFields, motorFields } from '../testing/records';

/** Clicks a dialog's button once it is enabled (it waits for the day's sign-ons to be read). */
async function clickEnabled(user: ReturnType<typeof userEvent.setup>, button: HTMLElement) {
  await waitFor(() => expect(button).toBeEnabled(), { timeout: 10_000 });
  await user.click(button);
}

/** The open dialog titled `title`; found by its text, since role queries over a whole page are slow in jsdom. */
async function dialogTitled(title: string) {
  const heading = await screen.findByText(title, { selector: 'h2' }, { timeout: 10_000 });
  return within(heading.closest<HTMLElement>('[role="dialog"]')!);
}

// Invented people and awards. Currency rule: an award is valid through its expiry date.
const noExpiry = { id: 'd1', name: 'IRB driver award', qualifies: 'driver' as const, awardedOn: '2024-10-01', expiresOn: null };
const longExpired = { id: 'c1', name: 'IRB crew award', qualifies: 'crew' as const, awardedOn: '2018-10-01', expiresOn: '2020-01-01' };

async function patrolScene(awardCheck?: 'warn' | 'block') {
  setViewportWidth(PHONE_WIDTH);
  const p = testPerson('driver');
  const session = { ...p.session, activeClub: { ...p.session.activeClub, ...(awardCheck ? { awardCheck } : {}) } };
  mockApi({ 'GET /api/auth/me': { status: 200, body: { ...p.me.body, activeClub: session.activeClub } } });
  const boatId = await createRecord(p.seed, 'boat', boatFields());
  const motorId = await createRecord(p.seed, 'motor', motorFields({ boatId }));
  await createRecord(p.seed, 'member', memberFields(p.ctx.userId, 'Ria Okafor', [noExpiry]));
  await createRecord(p.seed, 'member', memberFields('u-sam', 'Sam Whitcombe', [longExpired]));
  return { p, session, boatId, motorId };
}

describe('patrol on Today', () => {
  it('signs on with the award checked, warns for an expired award, launches with one tap and retrieves with another', async () => {
    const { p, session, boatId, motorId } = await patrolScene();
    const user = userEvent.setup({ delay: null });
    renderApp('/', session);
    const card = within(await screen.findByRole('article', { name: 'IRB 1 · Tern' }, { timeout: 10_000 }));
    expect(await card.findByText('Nobody signed on today.', {}, { timeout: 10_000 })).toBeInTheDocument();

    await user.click(card.getByRole('button', { name: 'Sign on to Tern' }));
    let dialog = await dialogTitled('Sign on to IRB 1 · Tern');
    expect(dialog.getByRole('status')).toHaveTextContent('IRB driver award current, no expiry.');
    await clickEnabled(user, dialog.getByRole('button', { name: 'Sign on' }));
    await waitFor(() => expect(card.getByRole('list', { name: 'Signed on today' })).toHaveTextContent('Driver: You'));

    await user.click(card.getByRole('button', { name: 'Sign on someone else' }));
    dialog = await dialogTitled('Sign on to IRB 1 · Tern');
    await user.click(dialog.getByLabelText('Who'));
    await user.click(await screen.findByRole('option', { name: 'Sam Whitcombe' }, { timeout: 10_000 }));
    await user.click(dialog.getByRole('button', { name: 'Crew' }));
    expect(dialog.getByRole('status')).toHaveTextContent(/^No current award for crew on \d{4}-\d\d-\d\d: IRB crew award expired on 2020-01-01\. Signing on anyway is the patrol captain's call\.$/);
    await clickEnabled(user, dialog.getByRole('button', { name: 'Sign on anyway' }));
    await waitFor(() => expect(card.getByRole('list', { name: 'Signed on today' })).toHaveTextContent('Crew: Sam Whitcombe · no current award'));

    await user.click(card.getByRole('button', { name: 'Launch Tern' }));
    const timer = await card.findByRole('timer', { name: 'Time on the water' }, { timeout: 10_000 });
    const first = timer.textContent;
    expect(first).toMatch(/^0:00:0\d$/);
    await waitFor(() => expect(timer.textContent).not.toBe(first), { timeout: 3000 });
    const [trip] = await listRecords(p.ctx.db, p.ctx.clubId, 'trip');
    expect(trip!.fields).toMatchObject({ boatId, motorId, driverId: p.ctx.userId, crewIds: ['u-sam'], purpose: 'patrol', retrievedAt: null });

    await user.click(card.getByRole('button', { name: 'Retrieve now' }));
    expect(await card.findByRole('button', { name: 'Launch Tern' }, { timeout: 10_000 })).toBeInTheDocument();
    const [back] = await listRecords(p.ctx.db, p.ctx.clubId, 'trip');
    expect(Date.parse(back!.fields.retrievedAt!)).toBeGreaterThanOrEqual(Date.parse(back!.fields.launchedAt));
    const signOns = await listRecords(p.ctx.db, p.ctx.clubId, 'signOn');
    expect(signOns.map((s) => [s.fields.memberId, s.fields.role])).toEqual([[p.ctx.userId, 'driver'], ['u-sam', 'crew']]);
  }, 60_000);

  it('moves a member signed on to another boat today, signing them off there first', async () => {
    const { p, session } = await patrolScene();
    await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 2', name: 'Skua' }));
    const user = userEvent.setup({ delay: null });
    renderApp('/', session);
    const tern = within(await screen.findByRole('article', { name: 'IRB 1 · Tern' }, { timeout: 10_000 }));
    await user.click(await tern.findByRole('button', { name: 'Sign on to Tern' }, { timeout: 10_000 }));
    await clickEnabled(user, (await dialogTitled('Sign on to IRB 1 · Tern')).getByRole('button', { name: 'Sign on' }));
    await waitFor(() => expect(tern.getByRole('list', { name: 'Signed on today' })).toHaveTextContent('Driver: You'));
    const skua = within(screen.getByRole('article', { name: 'IRB 2 · Skua' }));
    await user.click(skua.getByRole('button', { name: 'Sign on to Skua' }));
    const dialog = await dialogTitled('Sign on to IRB 2 · Skua');
    expect(await dialog.findByText('This signs you off IRB 1 · Tern first.', {}, { timeout: 10_000 })).toBeInTheDocument();
    await clickEnabled(user, dialog.getByRole('button', { name: 'Sign on' }));
    await waitFor(() => expect(skua.getByRole('list', { name: 'Signed on today' })).toHaveTextContent('Driver: You'));
    expect(tern.getByText('Nobody signed on today.')).toBeInTheDocument();
    const signOns = await listRecords(p.ctx.db, p.ctx.clubId, 'signOn');
    expect(signOns.map((s) => s.fields.signedOffAt === null)).toEqual([false, true]);
  }, 60_000);

  it('refuses the sign-on when the club blocks it without a current award', async () => {
    const { session } = await patrolScene('block');
    const user = userEvent.setup({ delay: null });
    renderApp('/', session);
    const card = within(await screen.findByRole('article', { name: 'IRB 1 · Tern' }, { timeout: 10_000 }));
    await user.click(await card.findByRole('button', { name: 'Sign on to Tern' }, { timeout: 10_000 }));
    const dialog = await dialogTitled('Sign on to IRB 1 · Tern');
    await user.click(dialog.getByRole('button', { name: 'Driver' }));
    await user.click(dialog.getByLabelText('Who'));
    await user.click(await screen.findByRole('option', { name: 'Sam Whitcombe' }, { timeout: 10_000 }));
    expect(dialog.getByRole('status')).toHaveTextContent(/no award on the member card qualifies for driving an IRB\. Your club requires a current award/);
    expect(dialog.getByRole('button', { name: 'Sign on' })).toBeDisabled();
  }, 40_000);

  it('asks before logging a launch of a stood-down boat', async () => {
    const { p, session, boatId } = await patrolScene();
    await createRecord(p.seed, 'defect', {
      boatId, motorId: null, checkId: null, itemId: null, severity: 'stand-down', description: 'Transom cracked', photos: [], status: 'open',
      reportedBy: 'u-sam', reportedAt: new Date().toISOString(), assignedTo: null, actionTaken: null, repairedAt: null, verifiedBy: null,
      verifiedAt: null, rejectedReason: null, notes: [],
    });
    const user = userEvent.setup({ delay: null });
    renderApp('/', session);
    const card = within(await screen.findByRole('article', { name: 'IRB 1 · Tern' }, { timeout: 10_000 }));
    await user.click(await card.findByRole('button', { name: 'Tern is stood down…' }, { timeout: 10_000 }));
    const dialog = await dialogTitled('Tern is stood down');
    await user.click(dialog.getByRole('button', { name: 'Do not launch' }));
    expect(await listRecords(p.ctx.db, p.ctx.clubId, 'trip')).toEqual([]);
  }, 40_000);

  it('leaves the launch and retrieval to a driver when a crew member looks', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    await createRecord(p.seed, 'boat', boatFields());
    renderApp('/', p.session);
    const card = within(await screen.findByRole('article', { name: 'IRB 1 · Tern' }, { timeout: 10_000 }));
    expect(await card.findByText('A driver logs the launch and retrieval.', {}, { timeout: 10_000 })).toBeInTheDocument();
    expect(card.queryByRole('button', { name: /^Launch/ })).toBeNull();
  }, 40_000);
});
