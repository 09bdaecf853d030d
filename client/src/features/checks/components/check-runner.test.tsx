import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { CAUTIONS, DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { getRecord, listRecords } from '@/db/queries';
import { updateRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { seedBoatAndTemplates } from '../testing/boat';
import { testPerson } from '@/test/test-person';

const item = (label: string) => within(screen.getByRole('region', { name: label }));

async function startLaunchCheck(role: 'crew' | 'supervisor' = 'crew', unit = 'kPa') {
  setViewportWidth(PHONE_WIDTH);
  const p = testPerson(role, unit);
  mockApi({ 'GET /api/auth/me': p.me });
  const boatId = await seedBoatAndTemplates(p.seed);
  const user = userEvent.setup();
  const view = renderApp(`/checks/start?type=launch&boat=${boatId}`, p.session);
  await user.click(await screen.findByRole('button', { name: 'Start launch check on Gannet' }));
  await screen.findByText('1 of 6');
  const checkId = view.router.state.location.pathname.split('/').pop()!;
  const stored = () => getRecord(p.ctx.db, p.ctx.clubId, 'check', checkId);
  return { p, user, view, checkId, stored, boatId };
}

describe('the check runner', () => {
  it('saves every answer on the phone at once and resumes where it was after a reload', async () => {
    const { p, user, view, checkId, stored } = await startLaunchCheck();
    expect(screen.getByRole('heading', { name: 'Hull and fittings' })).toBeInTheDocument();
    for (const label of ['Hull, floor and transom free of cuts, abrasion and lifting seams', 'Drain bungs in and secure', 'Motor clamp screws tight and safety chain fitted']) {
      await user.click(item(label).getByRole('button', { name: 'Pass' }));
    }
    await user.click(item('Handles, foot straps and capsize rope secure').getByRole('button', { name: 'Fail' }));
    await waitFor(async () => expect(Object.keys((await stored())!.fields.results)).toHaveLength(4));
    expect((await stored())!.fields).toMatchObject({ status: 'in-progress', results: { 'drain-bungs': { outcome: 'pass' }, handles: { outcome: 'fail' } } });

    view.unmount();
    renderApp(`/checks/run/${checkId}`, p.session);
    expect(await screen.findByText('2 of 6')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Air chambers and pressures' })).toBeInTheDocument();
  });

  it('judges a pressure live and offers a stand-down defect for a failed critical reading', async () => {
    const { p, user, checkId, stored, boatId } = await startLaunchCheck();
    await user.click(screen.getByRole('button', { name: 'Next' }));
    const port = 'Port side pontoon pressure';
    await user.type(item(port).getByLabelText(`${port} (kPa)`), '14');
    expect(item(port).getByRole('status')).toHaveTextContent('Below range: 14.0 kPa (working range 17.0 kPa to 24.0 kPa)');
    await user.click(item(port).getByRole('button', { name: 'Save reading' }));
    await waitFor(async () => expect((await stored())!.fields.results['pressure-port']).toEqual({ outcome: 'fail', value: 14 }));

    // The item redraws with the saved reading, so look it up afresh.
    await user.click(await waitFor(() => item(port).getByRole('button', { name: 'Report a defect' })));
    const dialog = within(await screen.findByRole('dialog'));
    expect(dialog.getByRole('button', { name: /^Stand-down/ })).toHaveAttribute('aria-pressed', 'true');
    await user.click(dialog.getByRole('button', { name: 'Save without a photo' }));
    await waitFor(async () => expect(await listRecords(p.ctx.db, p.ctx.clubId, 'defect')).toHaveLength(1));
    const [defect] = await listRecords(p.ctx.db, p.ctx.clubId, 'defect');
    expect(defect!.fields).toMatchObject({ boatId, checkId, itemId: 'pressure-port', severity: 'stand-down', status: 'open', description: 'Port side pontoon pressure: failed' });
    expect(await waitFor(() => item(port).getByRole('link', { name: 'Open the defect' }))).toBeInTheDocument();
    expect(item(port).getByText('Defect reported: stand-down, no photo, saved on this phone.')).toBeInTheDocument();
  });

  it('offers a limit defect for a failed minor item', async () => {
    const { user } = await startLaunchCheck();
    const label = 'Handles, foot straps and capsize rope secure';
    await user.click(item(label).getByRole('button', { name: 'Fail' }));
    await user.click(await item(label).findByRole('button', { name: 'Report a defect' }));
    expect(within(await screen.findByRole('dialog')).getByRole('button', { name: /^Limit/ })).toHaveAttribute('aria-pressed', 'true');
  });

  it('takes a pressure in psi and stores it in kPa', async () => {
    const { user, stored } = await startLaunchCheck('crew', 'psi');
    await user.click(screen.getByRole('button', { name: 'Next' }));
    const bow = 'Bow chamber pressure';
    await user.type(item(bow).getByLabelText(`${bow} (psi)`), '2.5');
    expect(item(bow).getByRole('status')).toHaveTextContent('In range: 2.50 psi (working range 2.47 psi to 3.48 psi)');
    await user.click(item(bow).getByRole('button', { name: 'Save reading' }));
    await waitFor(async () => expect((await stored())!.fields.results['pressure-bow']).toBeDefined());
    const kpa = (await stored())!.fields.results['pressure-bow']!.value as number;
    // NIST SP 811 (2008) B.8: 1 psi = 6.894 757 E+03 Pa (0.45359237 kg × 9.80665 m/s² ÷ (0.0254 m)²).
    expect(Math.abs(kpa - 2.5 * 6.894757293168361) / kpa).toBeLessThan(1e-9);
  });

  it('shows the test-run caution on the motor screen', async () => {
    const { user } = await startLaunchCheck();
    for (let i = 0; i < 3; i++) await user.click(screen.getByRole('button', { name: 'Next' }));
    expect(screen.getByRole('heading', { name: 'Motor and its test run' })).toBeInTheDocument();
    expect(screen.getByRole('note', { name: 'Caution' })).toHaveTextContent(CAUTIONS.testRun);
  });

  it('finishes only when every item is answered, then the check is complete', async () => {
    const { p, user, stored, view, checkId } = await startLaunchCheck();
    await view.router.navigate(`/checks/run/${checkId}?section=7`);
    expect(await screen.findByRole('heading', { name: 'Review and finish' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Finish launch check' })).toBeDisabled();

    const all = DEFAULT_LAUNCH_TEMPLATE.sections.flatMap((s) => s.items);
    await updateRecord(p.ctx, 'check', checkId, { results: Object.fromEntries(all.map((i) => [i.id, { outcome: 'na' as const }])) });
    // The button turns on when the answers written above reach the screen.
    const finish = await screen.findByRole('button', { name: 'Finish launch check' });
    await waitFor(() => expect(finish).toBeEnabled());
    await user.click(finish);
    expect(await screen.findByRole('heading', { name: 'Launch check complete' })).toBeInTheDocument();
    expect((await stored())!.fields).toMatchObject({ status: 'complete', completedAt: expect.any(String) });
  });
});

describe('starting a check without templates', () => {
  it('lets an admin set up the defaults', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('admin');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await seedBoatAndTemplates(p.seed, false);
    const user = userEvent.setup();
    renderApp(`/checks/start?type=stow&boat=${boatId}`, p.session);
    await user.click(await screen.findByRole('button', { name: 'Set up the default launch and stow checks' }));
    expect(await screen.findByRole('button', { name: 'Start stow check on Gannet' })).toBeInTheDocument();
    expect(await listRecords(p.ctx.db, p.ctx.clubId, 'checkTemplate')).toHaveLength(2);
  });

  it('tells crew to ask an admin', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await seedBoatAndTemplates(p.seed, false);
    renderApp(`/checks/start?type=launch&boat=${boatId}`, p.session);
    expect(await screen.findByText(/Ask an admin to set them up/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Start launch check/ })).toBeNull();
  });
});
