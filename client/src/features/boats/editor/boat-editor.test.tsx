import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields } from '../testing/records';
import { testPerson } from '@/test/test-person';

const PSI_KPA = 6.894757293168361; // NIST SP 811 (2008) B.8: 1 psi = 6.894 757 E+03 Pa

describe('fleet editing', () => {
  it('a supervisor adds a boat with ranges typed in psi, stored in kPa', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('supervisor', 'psi');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const user = userEvent.setup();
    const view = renderApp('/fleet/boats/new', p.session);
    await user.type(await screen.findByLabelText('Fleet number'), 'IRB 4');
    await user.type(screen.getByLabelText('Name'), 'Shearwater');
    for (const n of [1, 2, 3]) {
      const chamber = within(screen.getByRole('group', { name: `Air chamber ${n}` }));
      await user.type(chamber.getByLabelText('Lowest (psi)'), '2.5');
      await user.type(chamber.getByLabelText('Highest (psi)'), '3.5');
    }
    await user.click(screen.getByRole('button', { name: 'Save boat' }));
    await waitFor(() => expect(view.router.state.location.pathname).toMatch(/^\/boats\//));
    const [boat] = await listRecords(p.ctx.db, p.ctx.clubId, 'boat');
    const port = boat!.fields.airChambers.find((c) => c.id === 'port')!;
    expect(Math.abs(port.minKpa - 2.5 * PSI_KPA) / port.minKpa).toBeLessThan(1e-9);
    expect(Math.abs(port.maxKpa - 3.5 * PSI_KPA) / port.maxKpa).toBeLessThan(1e-9);
    // The boat file shows the range back in the club's unit.
    expect(await screen.findAllByText('2.50 psi to 3.50 psi')).toHaveLength(3);
  }, 30_000);

  it('crew see a boat specification read-only', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const id = await createRecord(p.seed, 'boat', boatFields());
    renderApp(`/fleet/boats/${id}`, p.session);
    expect(await screen.findByText(/Only a supervisor or admin may change the fleet/)).toBeInTheDocument();
    expect(screen.getByLabelText('Name')).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save boat' })).toBeNull();
  });
});
