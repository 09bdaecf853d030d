import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, incidentFields, memberFields, tripFields } from '../testing/records';

describe('the boat log in the boat file', () => {
  it('lists the boat\'s trips and incident notes newest first, with the way into each trip', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('driver');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await createRecord(p.seed, 'boat', boatFields());
    await createRecord(p.seed, 'member', memberFields('u-sam', 'Sam Whitcombe'));
    const early = await createRecord(p.seed, 'trip', tripFields({ boatId, motorId: null, purpose: 'training', driverId: 'u-sam', launchedAt: '2026-12-05T23:20:00Z', retrievedAt: '2026-12-06T00:05:00Z' }));
    await createRecord(p.seed, 'trip', tripFields({ boatId, motorId: null, purpose: 'rescue', launchedAt: '2026-12-06T03:00:00Z', retrievedAt: '2026-12-06T03:30:00Z' }));
    await createRecord(p.seed, 'incidentNote', incidentFields({ boatId, tripId: early, occurredAt: '2026-12-05T23:40:00Z', peopleHelped: 2, outcome: 'Both walked up the beach' }));
    for (let i = 0; i < 45; i++) {
      const at = new Date(Date.UTC(2026, 9, 1) + i * 86_400_000).toISOString();
      await createRecord(p.seed, 'trip', tripFields({ boatId, motorId: null, launchedAt: at, retrievedAt: at }));
    }
    renderApp(`/boats/${boatId}`, p.session);
    const log = within(await screen.findByRole('region', { name: 'Boat log' }, { timeout: 10_000 }));
    const items = within(log.getByRole('list', { name: 'Boat log entries' })).getAllByRole('link');
    // The date is written in the phone's language; the club's local times are AEDT (UTC+11).
    const texts = items.slice(0, 3).map((i) => i.textContent);
    expect(texts[0]).toMatch(/^Trip · Rescue.+ 14:00 · 30 min · driver a club member$/);
    expect(texts[1]).toMatch(/^Incident note · Assist.+ 10:40 · 2 people helped · Both walked up the beach$/);
    expect(texts[2]).toMatch(/^Trip · Training.+ 10:20 · 45 min · driver Sam Whitcombe$/);
    expect(items[2]).toHaveAttribute('href', `/trips/${early}`);
    // 48 entries: the first 40 are shown, the rest on request.
    expect(items).toHaveLength(40);
    await userEvent.setup({ delay: null }).click(log.getByRole('button', { name: 'Show older (8 more)' }));
    expect(within(log.getByRole('list', { name: 'Boat log entries' })).getAllByRole('link')).toHaveLength(48);
  }, 60_000);
});
