import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { openReplica } from '@/db/open';
import { createRecord } from '@/db/write';
import { defectFields } from '@/sync/test/device';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import type { SessionAnswer } from '../api/types';
import { noteSignedIn, setMemberPin, signInMember } from '../members/device';
import { hashPin } from '../members/pin';
import { roster } from '../members/roster';
import { tokenStore } from '../token-store';

// Invented members of the test club.
function person(id: string, displayName: string): SessionAnswer {
  const base = sessionAnswer('crew');
  return { ...base, accessToken: `access-${id}`, refreshToken: `refresh-${id}`, user: { id, email: `${id}@example.org`, displayName } };
}

async function twoOnTheDevice(ana: SessionAnswer, ben: SessionAnswer) {
  tokenStore.saveSession(ana);
  noteSignedIn(ana);
  await setMemberPin(ana.user.id, '2580');
  await signInMember(ben, '1357');
}

async function tap(user: ReturnType<typeof userEvent.setup>, digits: string) {
  for (const d of digits) await user.click(screen.getByRole('button', { name: d }));
}

describe('Switch member', () => {
  it('lists the members on the device and switches to one with the big keypad, with no signal', async () => {
    setViewportWidth(PHONE_WIDTH);
    const ana = person(`u-${crypto.randomUUID()}`, 'Ana Kereama');
    const ben = person(`u-${crypto.randomUUID()}`, 'Ben Halloran');
    await twoOnTheDevice(ana, ben);
    const { calls } = mockApi({}); // every request fails, as in the shed
    const user = userEvent.setup();
    renderApp('/members');

    const list = within(await screen.findByRole('list', { name: 'Members on this device' }));
    expect(list.getByText('Ben Halloran')).toBeInTheDocument();
    expect(list.getByText(/Using this device now/)).toBeInTheDocument();
    await user.click(list.getByText('Ana Kereama'));
    expect(await screen.findByText('Enter your PIN')).toBeInTheDocument();
    await tap(user, '2580');
    await user.click(screen.getByRole('button', { name: 'OK' }));

    expect(await screen.findByRole('heading', { name: 'Today' })).toBeInTheDocument();
    expect(within(screen.getByRole('banner')).getByText('Ana Kereama')).toBeInTheDocument();
    expect(tokenStore.getState().session?.user.id).toBe(ana.user.id);
    // No sign-in and no refresh: the PIN alone did it (the background "who am I" may still be tried).
    expect(calls.filter((c) => c.method === 'POST' && c.path.startsWith('/api/auth'))).toEqual([]);
  }, 30_000);

  it('says how many tries are left after a wrong PIN, and offers the password instead', async () => {
    setViewportWidth(PHONE_WIDTH);
    const ana = person(`u-${crypto.randomUUID()}`, 'Ana Kereama');
    const ben = person(`u-${crypto.randomUUID()}`, 'Ben Halloran');
    tokenStore.saveSession(ana);
    noteSignedIn(ana);
    const pin = await hashPin('2580', 1000);
    roster.update(ana.user.id, (m) => (m ? { ...m, pin } : null));
    await signInMember(ben);
    mockApi({});
    const user = userEvent.setup();
    renderApp('/members');

    await user.click(await screen.findByText('Ana Kereama'));
    await tap(user, '1111');
    await user.click(screen.getByRole('button', { name: 'OK' }));
    expect(await screen.findByText('That PIN is not right. 4 more tries before a wait.')).toBeInTheDocument();
    expect(tokenStore.getState().session?.user.id).toBe(ben.user.id);

    await user.click(screen.getByRole('button', { name: 'Forgotten your PIN? Sign in with your password' }));
    expect(await screen.findByLabelText('E-mail')).toHaveValue(ana.user.email);
  }, 30_000);

  it('warns before removing a member with changes not yet sent, and keeps them', async () => {
    setViewportWidth(PHONE_WIDTH);
    const ana = person(`u-${crypto.randomUUID()}`, 'Ana Kereama');
    const ben = person(`u-${crypto.randomUUID()}`, 'Ben Halloran');
    tokenStore.saveSession(ana);
    noteSignedIn(ana);
    const db = openReplica(ana.user.id);
    await createRecord({ db, userId: ana.user.id, clubId: ana.activeClub.id, role: 'crew' }, 'defect', defectFields({ reportedBy: ana.user.id }));
    await signInMember(ben);
    mockApi({});
    const user = userEvent.setup();
    renderApp('/members');

    expect(await screen.findByText(/1 change waiting to be sent/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove Ana Kereama from this device' }));
    const dialog = within(await screen.findByRole('dialog'));
    expect(await dialog.findByText(/has 1 change not yet sent to the club\. They stay on this device and are sent when Ana Kereama signs in here again/)).toBeInTheDocument();
    await user.click(dialog.getByRole('button', { name: 'Remove' }));
    expect(await screen.findByText('Ana Kereama is off this device. One change waits here until they sign in again.')).toBeInTheDocument();
    await waitFor(() => expect(roster.find(ana.user.id)).toBeUndefined());
    expect(await db.outbox.count()).toBe(1);
  }, 30_000);
});
