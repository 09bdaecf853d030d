import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, type ConflictRecord } from '@breakline/sync-protocol';
import { renderApp } from '@/test/render-app';
import { atTheDesk, PEOPLE, SLOW } from '../testing/desk';

const CONFLICT_ID = '0190d000-0000-7000-8000-000000000001';

function conflict(recordId: string, over: Partial<ConflictRecord> = {}): ConflictRecord {
  return {
    id: CONFLICT_ID, clubId: 'c-1', recordId, kind: 'boat', field: 'notes',
    keptValue: 'Bow handle loose, tightened', overruledValue: 'Bow handle loose: do not tow with it',
    kept: { deviceId: '0193aa00-0000-7000-8000-00000000a4f1', userId: PEOPLE.driver.userId, hlc: '001796515260000-00000-0193aa00-0000-7000-8000-00000000a4f1' },
    overruled: { deviceId: '0193bb00-0000-7000-8000-00000000b7c2', userId: PEOPLE.crew.userId, hlc: '001796515200000-00000-0193bb00-0000-7000-8000-00000000b7c2' },
    status: 'open', createdAt: '2026-12-06T00:05:00.000Z', ...over,
  };
}

async function openConflicts(settle: (body: unknown) => { status: number; body?: unknown } = () => ({ status: 200, body: {} })) {
  const bodies: unknown[] = [];
  const p = await atTheDesk('supervisor', ({ boatId }) => ({
    'GET /api/sync/conflicts': { status: 200, body: [conflict(boatId)] },
    [`POST /api/sync/conflicts/${CONFLICT_ID}/settle`]: (call) => { bodies.push(call.body); return settle(call.body); },
  }));
  renderApp('/review/conflicts', p.session);
  const card = within(await screen.findByRole('article', { name: 'Conflict: Notes of Boat IRB 2 Gannet' }, SLOW));
  return { p, card, bodies, user: userEvent.setup() };
}

describe('settling conflicts at the desk', { timeout: 90_000 }, () => {
  it('shows both values side by side with who wrote each, when and on which device', async () => {
    const { card } = await openConflicts();
    const [a, b] = [card.getByText('Value A: shown now').parentElement!, card.getByText('Value B: set aside').parentElement!];
    expect(within(a).getByText('Bow handle loose, tightened')).toBeInTheDocument();
    expect(within(a).getByText(PEOPLE.driver.displayName)).toBeInTheDocument();
    // 1796515260000 ms is 2026-12-06T00:01:00Z, 11:01 at the club (UTC+11, IANA tz 2026c).
    expect(within(a).getByText('Sun, 6 Dec 2026, 11:01:00')).toBeInTheDocument();
    expect(within(a).getByText('on device ending 00a4f1')).toBeInTheDocument();
    expect(within(b).getByText('Bow handle loose: do not tow with it')).toBeInTheDocument();
    expect(within(b).getByText(PEOPLE.crew.displayName)).toBeInTheDocument();
    expect(within(b).getByText('Sun, 6 Dec 2026, 11:00:00')).toBeInTheDocument();
    expect(within(b).getByText('on device ending 00b7c2')).toBeInTheDocument();
  });

  it('asks for a choice and a note before it settles', async () => {
    const { card, bodies, user } = await openConflicts();
    await user.click(card.getByRole('button', { name: 'Settle this conflict' }));
    expect(card.getByRole('alert')).toHaveTextContent('Choose which value the record keeps.');
    await user.click(card.getByLabelText('Use value B instead'));
    await user.click(card.getByRole('button', { name: 'Settle this conflict' }));
    expect(card.getByRole('alert')).toHaveTextContent("Write a note saying why, for the club's records.");
    expect(bodies).toEqual([]);
  });

  it('keeps the other value with a note', async () => {
    const { card, bodies, user } = await openConflicts();
    await user.click(card.getByLabelText('Use value B instead'));
    await user.click(card.getByLabelText('Note: why this value (kept with the decision)'));
    await user.paste('Gear officer checked the handle');
    await user.click(card.getByRole('button', { name: 'Settle this conflict' }));
    await waitFor(() => expect(bodies).toEqual([{ protocolVersion: PROTOCOL_VERSION, choice: 'overruled', note: 'Gear officer checked the handle' }]));
  });

  it('writes a third value with a note', async () => {
    const { card, bodies, user } = await openConflicts();
    await user.click(card.getByLabelText('Write another value'));
    const box = card.getByLabelText('New value');
    expect(box).toHaveValue('Bow handle loose, tightened');
    await user.clear(box);
    await user.click(box);
    await user.paste('Bow handle replaced 6 Dec');
    await user.click(card.getByLabelText('Note: why this value (kept with the decision)'));
    await user.paste('Both were out of date');
    await user.click(card.getByRole('button', { name: 'Settle this conflict' }));
    await waitFor(() => expect(bodies).toEqual([{ protocolVersion: PROTOCOL_VERSION, choice: 'other', value: 'Bow handle replaced 6 Dec', note: 'Both were out of date' }]));
  });

  it("shows the server's reason when another supervisor settled it first", async () => {
    const { card, user } = await openConflicts(() => ({
      status: 409, body: { statusCode: 409, code: 'conflict', message: 'That conflict was already settled by Tomas Varga.' },
    }));
    await user.click(card.getByLabelText('Keep value A'));
    await user.click(card.getByLabelText('Note: why this value (kept with the decision)'));
    await user.paste('Fine as it is');
    await user.click(card.getByRole('button', { name: 'Settle this conflict' }));
    expect(await card.findByText('The conflict was not settled')).toBeInTheDocument();
    expect(card.getByText('That conflict was already settled by Tomas Varga.')).toBeInTheDocument();
  });
});
