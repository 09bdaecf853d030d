import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { DefectStatus, Role } from '@breakline/sync-protocol';
import { getRecord } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { defectFields } from '../testing/records';
import { testPerson } from '@/test/test-person';

const STEPS = ['Assign the repair', 'Mark repaired', 'Verify and return to service', 'Reject: not a defect', 'Reopen'];

async function openDefect(role: Role, status: DefectStatus = 'open') {
  setViewportWidth(PHONE_WIDTH);
  const p = testPerson(role);
  mockApi({ 'GET /api/auth/me': p.me }); // no member list: as with no signal
  const boatId = await createRecord(p.seed, 'boat', {
    fleetNumber: 'IRB 1', name: 'Tern', hullSerial: null, airChambers: [], requiredGear: [], notes: '', inService: true,
  });
  const extra = status === 'repaired' ? { actionTaken: 'Valve core replaced', repairedAt: '2026-12-01T00:00:00Z' } : {};
  const id = await createRecord(p.seed, 'defect', defectFields({ boatId, status, ...extra }));
  renderApp(`/defects/${id}`, p.session);
  await screen.findByRole('heading', { name: 'Starboard pontoon losing air at the valve' });
  const stored = async () => (await getRecord(p.ctx.db, p.ctx.clubId, 'defect', id))!.fields;
  return { user: userEvent.setup(), stored };
}

const shownSteps = () => STEPS.filter((name) => screen.queryByRole('button', { name }) !== null);

describe('defect path, by role', () => {
  it.each<[Role, DefectStatus, string[]]>([
    ['crew', 'open', []],
    ['driver', 'open', ['Mark repaired']],
    ['supervisor', 'open', ['Assign the repair', 'Mark repaired', 'Reject: not a defect']],
    ['driver', 'repaired', []],
    ['supervisor', 'repaired', ['Verify and return to service', 'Reject: not a defect']],
  ])('a %s on a %s defect sees %j', async (role, status, steps) => {
    await openDefect(role, status);
    expect(shownSteps()).toEqual(steps);
  });

  it('a driver marks it repaired with the action taken', async () => {
    const { user, stored } = await openDefect('driver');
    await user.click(screen.getByRole('button', { name: 'Mark repaired' }));
    const dialog = within(await screen.findByRole('dialog'));
    await user.click(dialog.getByRole('button', { name: 'Save repair' }));
    expect(dialog.getByText('Say what was done to repair it.')).toBeInTheDocument();
    await user.type(dialog.getByLabelText('What was done'), 'Valve core replaced and tested');
    await user.click(dialog.getByRole('button', { name: 'Save repair' }));
    await waitFor(async () => expect(await stored()).toMatchObject({ status: 'repaired', actionTaken: 'Valve core replaced and tested' }));
    expect(await screen.findByText(/Action taken .*Valve core replaced and tested/)).toBeInTheDocument();
  });

  it('a supervisor verifies a repair, returning the boat to service', async () => {
    const { user, stored } = await openDefect('supervisor', 'repaired');
    await user.click(screen.getByRole('button', { name: 'Verify and return to service' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Verify and return to service' }));
    await waitFor(async () => expect(await stored()).toMatchObject({ status: 'verified', verifiedBy: expect.any(String), verifiedAt: expect.any(String) }));
  });

  it('shows the message when the phone refuses a step: a rejection needs its reason', async () => {
    const { user, stored } = await openDefect('supervisor');
    await user.click(screen.getByRole('button', { name: 'Reject: not a defect' }));
    const dialog = within(await screen.findByRole('dialog'));
    await user.click(dialog.getByRole('button', { name: 'Reject' }));
    expect(await dialog.findByText('Say why the report is not a defect.')).toBeInTheDocument();
    expect((await stored()).status).toBe('open');
  });
});
