import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, defectFields, motorFields } from '../testing/records';
import { testPerson } from '@/test/test-person';

describe('the boat file', () => {
  it('shows the state, chamber ranges in the club unit, the motor and its service, and open defects with what was done', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew', 'bar');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await createRecord(p.seed, 'boat', boatFields());
    await createRecord(p.seed, 'motor', motorFields({ boatId, hourMeter: 205 }));
    await createRecord(p.seed, 'defect', defectFields({ boatId, status: 'repaired', actionTaken: 'Seam re-glued and left to cure 24 h', repairedAt: '2026-12-01T00:00:00Z' }));
    renderApp(`/boats/${boatId}`, p.session);

    expect(await screen.findByRole('heading', { name: 'IRB 2 · Gannet' })).toBeInTheDocument();
    const state = within(screen.getByRole('region', { name: 'State' }));
    expect(state.getByText('Stood down')).toBeInTheDocument();
    // 17 kPa = 0.170 bar, 24 kPa = 0.240 bar (NIST SP 811 B.8: 1 bar = 100 kPa exactly).
    expect(within(screen.getByRole('table', { name: 'Air chambers' })).getAllByText('0.170 bar to 0.240 bar')).toHaveLength(3);
    const motor = within(screen.getByRole('region', { name: 'Motor fitted' }));
    expect(motor.getByText('Service overdue')).toBeInTheDocument();
    const defects = within(await screen.findByRole('region', { name: 'Defects' }));
    expect(defects.getByText('Open defects (1)')).toBeInTheDocument();
    expect(defects.getByText(/Action taken .*Seam re-glued and left to cure 24 h/)).toBeInTheDocument();
    // The history is one log (checks among the rest), not a second list of checks beside it.
    const log = within(await screen.findByRole('region', { name: 'Boat log' }));
    expect(log.getByText(/Defect reported/)).toBeInTheDocument();
    expect(log.getByText('Repair')).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Recent checks' })).not.toBeInTheDocument();
  }, 20_000);
});
