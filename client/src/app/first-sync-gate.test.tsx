import { act, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { closeReplicas, openReplica } from '@/db/open';
import { updateClubState } from '@/db/replica-state';
import { tokenStore } from '@/features/auth/token-store';
import { syncActivity } from '@/sync/activity';
import { sessionAnswer } from '@/test/fixtures';
import { FirstSyncGate } from './first-sync-gate';

afterEach(async () => {
  syncActivity.set({ running: false, progress: null });
  await openReplica('u-1').delete();
  closeReplicas();
});

function renderGate() {
  tokenStore.saveSession(sessionAnswer('driver'));
  return render(<FirstSyncGate><p>Boat states</p></FirstSyncGate>);
}

describe('the first sync gate', () => {
  it('shows how far the first pull has come, as n of about m and a bar, until it is done', async () => {
    syncActivity.set({ running: true, progress: { phase: 'receiving', done: 4000, more: true, total: 20000 } });
    renderGate();
    expect(await screen.findByText(/4,000 of about 20,000 records on this phone/)).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Records received' })).toHaveAttribute('aria-valuenow', '4000');
    expect(screen.queryByText('Boat states')).not.toBeInTheDocument();

    act(() => syncActivity.set({ progress: { phase: 'receiving', done: 20000, more: false } }));
    expect(await screen.findByText(/20,000 records on this phone so far/)).toBeInTheDocument();
    await act(() => updateClubState(openReplica('u-1'), 'c-1', { lastSyncAt: new Date().toISOString() }));
    expect(await screen.findByText('Boat states')).toBeInTheDocument();
  });

  it('shows the count without a bar when the server did not say how many are left', async () => {
    syncActivity.set({ running: true, progress: { phase: 'receiving', done: 1000, more: true } });
    renderGate();
    expect(await screen.findByText(/1,000 records on this phone so far/)).toBeInTheDocument();
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
  });
});
