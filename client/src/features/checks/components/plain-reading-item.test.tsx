import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { seedBoatAndTemplates } from '../testing/boat';

describe('a reading in its own unit', () => {
  it('is judged live against the template limits and saved as typed', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await seedBoatAndTemplates(p.seed, false);
    await createRecord(p.seed, 'checkTemplate', {
      checkType: 'launch', name: 'Launch check', templateVersion: 1, retired: false,
      sections: [{ id: 'fuel', title: 'Fuel system', system: 'fuel', items: [{ id: 'fuel-volume', label: 'Fuel in the bladder', kind: 'reading', critical: false, unit: 'L', min: 5, max: 25 }] }],
    });
    const user = userEvent.setup();
    renderApp(`/checks/start?type=launch&boat=${boatId}`, p.session);
    await user.click(await screen.findByRole('button', { name: 'Start launch check on Gannet' }));
    const item = within(await screen.findByRole('region', { name: 'Fuel in the bladder' }));
    expect(item.getByText('Acceptable: 5 to 25 L')).toBeInTheDocument();
    await user.type(item.getByLabelText('Fuel in the bladder (L)'), '3,5');
    expect(item.getByRole('status')).toHaveTextContent('Out of range: 3.5 L (acceptable 5 to 25 L)');
    await user.click(item.getByRole('button', { name: 'Save reading' }));
    await waitFor(async () => expect((await listRecords(p.ctx.db, p.ctx.clubId, 'check'))[0]!.fields.results['fuel-volume']).toEqual({ outcome: 'fail', value: 3.5 }));
    // No pressure words for a reading that is not a chamber's.
    expect(screen.queryByText(/working range/)).toBeNull();
  }, 60_000);
});
