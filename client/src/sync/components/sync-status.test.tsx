import { act, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { closeReplicas, openReplica } from '@/db/open';
import { savePhoto } from '@/db/photos';
import { createRecord, updateRecord } from '@/db/write';
import { tokenStore } from '@/features/auth/token-store';
import { sessionAnswer } from '@/test/fixtures';
import { syncActivity } from '../activity';
import { STORAGE_NOT_PERSISTED } from '../persist';
import { SyncRunner } from '../runner';
import { FakeBackend } from '../test/fake-backend';
import { defectFields, testDevice } from '../test/device';
import { SyncStatus } from './sync-status';

function setUp(role: 'crew' | 'driver' = 'driver') {
  const backend = new FakeBackend();
  backend.now = Date.now(); // the component words "ago" against the real clock
  tokenStore.saveSession(sessionAnswer(role));
  backend.grant('access-1', { userId: 'u-1', role, clubId: 'c-1' });
  const scope = { userId: 'u-1', clubId: 'c-1', role };
  const runner = new SyncRunner({
    auth: { scope: () => scope, token: async () => 'access-1', afterUnauthorized: async () => null, sessionLost: () => undefined },
    openDb: openReplica,
    fetch: backend.fetch,
    now: () => backend.now,
    onOutdated: () => undefined,
    setTimer: () => 0,
    clearTimer: () => undefined,
  });
  const writer = { db: openReplica('u-1'), ...scope, now: () => backend.now };
  return { backend, runner, writer };
}

/** Renders the status, lets the sync settle, and opens its details, as a person taps it. */
async function openDetails(runner: SyncRunner) {
  render(<SyncStatus runner={runner} />);
  await act(() => runner.idle());
  const user = userEvent.setup();
  await user.click(await screen.findByRole('button', { name: /^Sync:/ }));
  return user;
}

afterEach(async () => {
  syncActivity.set({ storage: 'unknown' });
  await openReplica('u-1').delete();
  closeReplicas();
});

describe('sync status', () => {
  it('shows changes waiting and no signal, then all sent after "Sync now"', async () => {
    const { backend, runner, writer } = setUp();
    await createRecord(writer, 'defect', defectFields({ reportedBy: writer.userId }));
    await createRecord(writer, 'defect', defectFields({ description: 'Tiller grip split', reportedBy: writer.userId }));
    backend.offline = true;
    render(<SyncStatus runner={runner} />);
    await act(() => runner.idle());
    const button = await screen.findByRole('button', { name: 'Sync: No signal' });
    expect(within(button).getByText('2')).toBeInTheDocument();
    const user = userEvent.setup();
    await user.click(button);
    // The details load on the first tap.
    const dialog = await screen.findByRole('dialog', { name: 'Sync' });
    expect(within(dialog).getByText('2 changes waiting to be sent')).toBeInTheDocument();
    expect(within(dialog).getByText('Not synced yet on this phone')).toBeInTheDocument();
    expect(within(dialog).getByText(/^No signal\. Changes stay on this phone/)).toBeInTheDocument();

    backend.offline = false;
    await user.click(within(dialog).getByRole('button', { name: 'Sync now' }));
    await act(() => runner.idle());
    expect(await within(dialog).findByText('All changes sent')).toBeInTheDocument();
    // The outbox empties after the push; the last-sync time is written once the pull after it ends.
    expect(await within(dialog).findByText(/^Last synced /, {}, { timeout: 5000 })).toBeInTheDocument();
    expect(within(dialog).queryByText(/No signal/)).toBeNull();
  });

  it('lists a refused change with the server message until dismissed, and open conflicts', async () => {
    const { backend, runner, writer } = setUp();
    const id = await createRecord(writer, 'defect', defectFields({ reportedBy: writer.userId }));
    await runner.requestSync();
    const ben = testDevice(backend, 'member-ben', 'driver', 'c-1');
    await ben.sync();
    await updateRecord(ben.writer, 'defect', id, { description: 'Strap frayed at both ends' });
    await ben.sync();
    await updateRecord(writer, 'defect', id, { description: 'Strap frayed, one end only' });
    backend.grant('access-1', { userId: 'u-1', role: 'crew', clubId: 'c-1' }); // role lowered on the server
    await updateRecord(writer, 'defect', id, { status: 'repaired' });
    const user = await openDetails(runner);
    const refused = await screen.findByText(/Your change to a defect \(status\) was not saved\. Only a driver, supervisor or admin/);
    expect(screen.getByText(/^1 conflict waiting for a supervisor/)).toBeInTheDocument();
    // Her own change met Ben's: she is told, and may put the note away once read.
    const raised = screen.getByText("Your change to a defect met another phone's change to the same field. Both values are kept, and a supervisor chooses one at the Review desk.");
    await user.click(within(refused.closest('[role="alert"]') as HTMLElement).getByRole('button', { name: 'Dismiss' }));
    await waitFor(() => expect(screen.queryByText(/was not saved/)).toBeNull());
    await user.click(within(raised.closest('[role="alert"]') as HTMLElement).getByRole('button', { name: 'Dismiss' }));
    await waitFor(() => expect(screen.queryByText(/met another phone's change/)).toBeNull());
  });

  it('sends a refused change again on request, once the server takes it', async () => {
    const { backend, runner, writer } = setUp();
    const id = await createRecord(writer, 'defect', defectFields({ reportedBy: writer.userId }));
    await runner.requestSync();
    backend.grant('access-1', { userId: 'u-1', role: 'crew', clubId: 'c-1' }); // role lowered on the server
    await updateRecord(writer, 'defect', id, { status: 'repaired' });
    const user = await openDetails(runner);
    const refused = await screen.findByText(/Your change to a defect \(status\) was not saved/);
    backend.grant('access-1', { userId: 'u-1', role: 'driver', clubId: 'c-1' }); // an admin puts it right
    await user.click(within(refused.closest('[role="alert"]') as HTMLElement).getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(screen.queryByText(/was not saved/)).toBeNull());
    // Queued again, the change goes out with the sync the button asked for.
    await waitFor(() => expect(backend.server.records('c-1').find((r) => r.id === id)?.fields.status).toBe('repaired'));
    await act(() => runner.idle());
  });

  it('shows a refused photo with the reason, and sends it when the person tries again', async () => {
    const { backend, runner, writer } = setUp();
    // Starts like a JPEG (FF D8 FF E0); bigger than the limit set below.
    const bytes = new Uint8Array(300).fill(7);
    bytes.set([0xff, 0xd8, 0xff, 0xe0]);
    const sha = await savePhoto(writer.db, 'c-1', bytes.buffer, 'image/jpeg');
    await createRecord(writer, 'defect', defectFields({ photos: [sha], reportedBy: writer.userId }));
    backend.photoLimitBytes = 100;
    render(<SyncStatus runner={runner} />);
    await act(() => runner.idle());
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: /^Sync: Last synced/ }));
    const alert = (await screen.findByText(/^A photo was not sent\. The photo is larger than the 100 bytes/)).closest('[role="alert"]') as HTMLElement;
    expect(alert).toHaveTextContent('It stays on this phone.');
    backend.photoLimitBytes = 10_000;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(backend.photos.has(`c-1/${sha}`)).toBe(true));
    await act(() => runner.idle());
    expect(screen.queryByText(/A photo was not sent/)).toBeNull();
  });

  it('says what a refused persistent-storage request means', async () => {
    const { runner } = setUp();
    render(<SyncStatus runner={runner} />);
    await act(() => runner.idle());
    act(() => syncActivity.set({ storage: 'refused' }));
    await userEvent.setup().click(await screen.findByRole('button', { name: /^Sync:/ }));
    expect(await screen.findByText(STORAGE_NOT_PERSISTED)).toBeInTheDocument();
    expect(STORAGE_NOT_PERSISTED).toMatch(/may clear changes not yet sent if the phone runs short of space or the app is not used for days/);
  });
});
