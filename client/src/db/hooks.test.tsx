import { act, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { tokenStore } from '@/features/auth/token-store';
import { syncOnce } from '@/sync/engine';
import { FakeBackend } from '@/sync/test/fake-backend';
import { BOAT_ID, defectFields, testDevice } from '@/sync/test/device';
import { sessionAnswer } from '@/test/fixtures';
import { useRecord, useRecords, useReplica } from './hooks';
import { closeReplicas, openReplica } from './open';
import { createRecord, updateRecord, type WriteContext } from './write';

let writer: WriteContext | undefined;
/** The server and this phone share the test's clock, so no change is refused for drift. */
let clock: () => number = Date.now;
/** Every line the list rendered, to catch an edit shown undone for a moment. */
const rendered: string[] = [];

function DefectList() {
  writer = { ...useReplica(), now: clock };
  const defects = useRecords('defect', { boatId: BOAT_ID });
  if (!defects) return <p>Loading</p>;
  const lines = defects.map((d) => `${d.fields.description} · ${d.fields.severity}${d.waiting ? ' · waiting' : ''}`);
  rendered.push(...lines);
  return (
    <ul>
      {lines.map((line, i) => (
        <li key={defects[i]!.id}>{line}</li>
      ))}
    </ul>
  );
}

function OneDefect({ id }: { id: string }) {
  const defect = useRecord('defect', id);
  return <p>{defect === undefined ? 'Loading' : defect === null ? 'Not on this phone' : defect.fields.description}</p>;
}

afterEach(async () => {
  await openReplica('u-1').delete();
  closeReplicas();
});

describe('live reads', () => {
  it('show a local write at once and a pulled change when it lands, edits kept on top', async () => {
    const backend = new FakeBackend();
    clock = () => backend.now;
    tokenStore.saveSession(sessionAnswer('driver'));
    backend.grant('access-1', { userId: 'u-1', role: 'driver', clubId: 'c-1' });
    const ben = testDevice(backend, 'member-ben', 'driver', 'c-1');
    render(<DefectList />);
    expect(await screen.findByRole('list')).toBeEmptyDOMElement();

    const id = await act(() => createRecord(writer!, 'defect', defectFields({ reportedBy: writer!.userId })));
    expect(await screen.findByText('Starboard handle strap frayed near the transom · limit · waiting')).toBeInTheDocument();

    const scope = { userId: 'u-1', clubId: 'c-1', role: 'driver' as const };
    const auth = { scope: () => scope, token: async () => 'access-1', afterUnauthorized: async () => null, sessionLost: () => undefined };
    const sync = () => syncOnce({ db: writer!.db, scope, auth, fetch: backend.fetch, now: () => backend.now, onOutdated: () => undefined });
    await act(sync);
    expect(await screen.findByText('Starboard handle strap frayed near the transom · limit')).toBeInTheDocument();

    await ben.sync();
    await updateRecord(ben.writer, 'defect', id, { description: 'Strap frayed; spare fitted' });
    await ben.sync();
    await act(() => updateRecord(writer!, 'defect', id, { severity: 'stand-down' }));
    const fromEdit = rendered.length;
    await act(sync);
    expect(await screen.findByText('Strap frayed; spare fitted · stand-down')).toBeInTheDocument();
    expect(rendered.slice(fromEdit).filter((line) => !line.includes('stand-down'))).toEqual([]);
  });

  it('reads one record, and says when the phone does not have it', async () => {
    tokenStore.saveSession(sessionAnswer('crew'));
    const { rerender } = render(<DefectList />);
    const id = await act(() => createRecord(writer!, 'defect', defectFields({ description: 'Cracked valve cap', reportedBy: writer!.userId })));
    rerender(<OneDefect id={id} />);
    expect(await screen.findByText('Cracked valve cap')).toBeInTheDocument();
    rerender(<OneDefect id="0190f1a0-0000-7000-8000-0000000000ff" />);
    expect(await screen.findByText('Not on this phone')).toBeInTheDocument();
  });
});
