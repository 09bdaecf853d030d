import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/test/render-app';
import { atTheDesk, checkFields, PEOPLE, SLOW } from '../testing/desk';

const ID = '0190c000-0000-7000-8000-0000000000aa';

describe('a record page on the desk', { timeout: 90_000 }, () => {
  it('shows every version, newest first: who, when, which device, and what changed item by item', async () => {
    const p = await atTheDesk('supervisor', ({ boatId }) => {
      const created = checkFields(boatId, { status: 'in-progress', completedAt: null, results: { hull: { outcome: 'pass' } } });
      return {
        [`GET /api/records/check/${ID}/history`]: {
          status: 200,
          body: {
            kind: 'check', id: ID,
            versions: [
              {
                version: 1, hlc: '000001796500000-00000-dev-a', at: '2026-12-05T20:11:00.000Z', user: { id: PEOPLE.crew.userId, name: PEOPLE.crew.displayName },
                deviceId: '0193aa00-0000-7000-8000-00000000a4f1', status: 'applied', deleted: false,
                changes: Object.fromEntries(Object.entries(created).map(([k, v]) => [k, { from: null, to: v, label: k }])),
              },
              {
                version: 2, hlc: '000001796500900-00000-dev-b', at: '2026-12-05T20:26:00.000Z', user: { id: PEOPLE.driver.userId, name: PEOPLE.driver.displayName },
                deviceId: '0193bb00-0000-7000-8000-00000000b7c2', status: 'merged', deleted: false,
                changes: {
                  status: { from: 'in-progress', to: 'complete', label: 'status' },
                  results: { from: { hull: { outcome: 'pass' } }, to: { hull: { outcome: 'fail', note: 'Gouge near the transom' } }, label: 'results' },
                },
              },
              {
                version: 3, hlc: '000001796501000-00000-server', at: '2026-12-06T07:00:00.000Z', user: { id: 'u-gone', name: null },
                deviceId: 'server', status: 'settled', deleted: false, changes: {},
              },
            ],
          },
        },
      };
    });
    renderApp(`/review/records/check/${ID}`, p.session);
    const list = await screen.findAllByRole('listitem', {}, SLOW);
    expect(list.map((li) => li.getAttribute('aria-label'))).toEqual(['Version 3', 'Version 2', 'Version 1']);

    const v2 = within(screen.getByRole('listitem', { name: 'Version 2' }));
    expect(v2.getByText(`Version 2: changed by ${PEOPLE.driver.displayName}`)).toBeInTheDocument();
    // Club time: Australia/Sydney keeps daylight time (UTC+11) from 4 Oct 2026 (IANA tz database 2026c),
    // so 20:26Z on the 5th is 07:26 on Sunday the 6th.
    expect(v2.getByText('Sun, 6 Dec 2026, 07:26:00 · from device ending 00b7c2 · merged with changes from another device')).toBeInTheDocument();
    const changes = within(v2.getByRole('table', { name: 'What version 2 changed' }));
    expect(changes.getByRole('row', { name: 'Status In progress Complete' })).toBeInTheDocument();
    expect(changes.getByRole('row', { name: 'Check item: hull Passed Failed · “Gouge near the transom”' })).toBeInTheDocument();

    const v3 = within(screen.getByRole('listitem', { name: 'Version 3' }));
    expect(v3.getByText('Version 3: changed by a former member')).toBeInTheDocument();
    expect(v3.getByText(/from the Review desk · a supervisor settled a conflict/)).toBeInTheDocument();

    // "Now" is what the versions leave; the check is not on this computer, so sign-off waits for the sync.
    expect(await screen.findByRole('heading', { name: 'Launch check · IRB 2 Gannet · Sun, 6 Dec 2026, 07:10' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Sign off this check' })).toBeDisabled();
    expect(screen.getByText(/has not reached this computer yet/)).toBeInTheDocument();
  });

  it('says plainly when the record is not in the club', async () => {
    const p = await atTheDesk('supervisor', () => ({
      [`GET /api/records/defect/${ID}/history`]: { status: 404, body: { statusCode: 404, code: 'not_found', message: 'There is no such defect in your club.' } },
    }));
    renderApp(`/review/records/defect/${ID}`, p.session);
    expect(await screen.findByText('The versions of this record could not be loaded', {}, SLOW)).toBeInTheDocument();
    expect(screen.getByText('There is no such defect in your club.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Try again' })).not.toBeInTheDocument();
  });

  it('keeps incident notes behind their caution', async () => {
    const p = await atTheDesk('supervisor', () => ({
      [`GET /api/records/incidentNote/${ID}/history`]: { status: 200, body: { versions: [] } },
    }));
    renderApp(`/review/records/incidentNote/${ID}`, p.session);
    expect(await screen.findByText(/Incident notes can hold health information/, {}, SLOW)).toBeInTheDocument();
  });
});
