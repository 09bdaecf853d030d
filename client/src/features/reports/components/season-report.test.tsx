import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { mockApi, type MockAnswer, type RecordedCall } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { DESKTOP_WIDTH, setViewportWidth } from '@/test/viewport';

const SLOW = { timeout: 30_000 };
const JOB = '0190e000-0000-7000-8000-000000000001';

// Invented figures, in the shape GET /api/reports/season answers.
const figures = {
  club: { id: 'c-1', name: 'Saltmarsh Heads Surf Club', timeZone: 'Australia/Sydney' },
  from: '2026-11-02', to: '2026-11-15', generatedAt: '2026-12-06T00:00:00.000Z',
  weeks: ['2026-11-02', '2026-11-09'],
  hoursOnWater: {
    total: 7.5,
    byBoat: [
      { boatId: 'b-1', boatName: 'Gannet', fleetNumber: 'IRB 2', totalHours: 5.25, weekly: [2, 3.25] },
      { boatId: 'b-2', boatName: 'Tern', fleetNumber: 'IRB 3', totalHours: 2.25, weekly: [2.25, 0] },
      { boatId: 'b-3', boatName: 'Petrel', fleetNumber: 'IRB 4', totalHours: 0, weekly: [0, 0] },
    ],
  },
  trips: { total: 9, open: 1, byPurpose: { patrol: 5, training: 2, rescue: 1, search: 0, 'preventive-action': 1, 'event-support': 0, 'maintenance-run': 0 } },
  defects: { raised: 4, closed: 2, medianHoursToRepair: 30, repairedCount: 3, weekly: [{ week: '2026-11-02', raised: 3, returnedToService: 1 }, { week: '2026-11-09', raised: 1, returnedToService: 1 }] },
  rescues: { incidents: 1, persons: 2 },
  assists: { incidents: 3, persons: 3 },
};

function openReport(handlers: Record<string, MockAnswer | ((c: RecordedCall) => MockAnswer)> = {}) {
  setViewportWidth(DESKTOP_WIDTH);
  // Charts measure their box; jsdom has no layout, so give them a fixed one.
  vi.stubGlobal('ResizeObserver', class { observe() {} unobserve() {} disconnect() {} });
  const p = testPerson('supervisor');
  const api = mockApi({ 'GET /api/auth/me': p.me, 'GET /api/reports/season': { status: 200, body: figures }, ...handlers });
  renderApp('/season-report?from=2026-11-02&to=2026-11-15', p.session);
  return { api, user: userEvent.setup() };
}

describe('Season report', { timeout: 90_000 }, () => {
  it('asks for the chosen dates and shows each figure with its chart and numbers', async () => {
    const { api } = openReport();
    const hours = within(await screen.findByRole('region', { name: 'Hours on the water per boat, by week' }, SLOW));
    expect(api.calls.find((c) => c.path.startsWith('/api/reports/season'))!.path).toBe('/api/reports/season?from=2026-11-02&to=2026-11-15');
    const boats = within(hours.getByRole('table', { name: 'Hours on the water per boat' }));
    expect(boats.getAllByRole('row').map((r) => r.textContent)).toEqual(['BoatHours in these dates', 'IRB 2 Gannet5.3', 'IRB 3 Tern2.3', 'IRB 4 Petrel0']);
    const purposes = within(screen.getByRole('table', { name: 'Trips by purpose' }));
    expect(purposes.getByRole('row', { name: 'Patrol 5' })).toBeInTheDocument();
    expect(purposes.getByRole('row', { name: 'Preventive action 1' })).toBeInTheDocument();
    const defects = within(screen.getByRole('table', { name: 'Defects' }));
    // 30 hours is under two days, so it reads in hours.
    expect(defects.getByRole('row', { name: 'Median time from report to repair 30 h' })).toBeInTheDocument();
    expect(screen.getByText('1 not yet retrieved, left out of the hours')).toBeInTheDocument();
  });

  it('makes the PDF for the committee: starts the job, follows it, and downloads the file', async () => {
    let polls = 0;
    const saved: string[] = [];
    vi.stubGlobal('URL', Object.assign(URL, { createObjectURL: () => 'blob:pdf', revokeObjectURL: () => {} }));
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) { saved.push(this.download); });
    const { api, user } = openReport({
      'POST /api/reports/season/pdf': { status: 202, body: { jobId: JOB, id: JOB, state: 'queued' } },
      [`GET /api/reports/jobs/${JOB}`]: () => ({ status: 200, body: { id: JOB, state: polls++ === 0 ? 'working' : 'done' } }),
      [`GET /api/reports/jobs/${JOB}/file`]: { status: 200, body: '%PDF-1.7' },
    });
    await user.click(await screen.findByRole('button', { name: 'PDF for the committee' }, SLOW));
    expect(await screen.findByText('Making the PDF…', { selector: '.MuiAlert-message' })).toBeInTheDocument();
    expect(await screen.findByText('The PDF is ready; your browser is saving it.', {}, SLOW)).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'POST')!.body).toEqual({ from: '2026-11-02', to: '2026-11-15' });
    expect(saved).toEqual(['breakline-season-report-2026-11-02-to-2026-11-15.pdf']);
  });

  it("says why when the PDF job failed, and offers to try again", async () => {
    const { user } = openReport({
      'POST /api/reports/season/pdf': { status: 202, body: { jobId: JOB } },
      [`GET /api/reports/jobs/${JOB}`]: { status: 200, body: { id: JOB, state: 'failed', error: 'A trip is retrieved before it was launched.' } },
    });
    await user.click(await screen.findByRole('button', { name: 'PDF for the committee' }, SLOW));
    expect(await screen.findByText(/The PDF could not be made: A trip is retrieved before it was launched\. Try again/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('shows a broken answer as an error, not as a chart of zeros', async () => {
    openReport({ 'GET /api/reports/season': { status: 200, body: { weeks: [] } } });
    expect(await screen.findByText("The season's figures could not be loaded", {}, SLOW)).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('region', { name: 'Trips by purpose' })).not.toBeInTheDocument());
  });
});
