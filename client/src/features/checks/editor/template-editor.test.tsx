import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { getRecord, listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { seedBoatAndTemplates } from '../testing/boat';

// A big form on a shared, busy machine: wait longer for the lazy route and the live queries.
configure({ asyncUtilTimeout: 15_000, defaultHidden: true });

type User = ReturnType<typeof userEvent.setup>;
const section = (n: number) => within(screen.getByRole('region', { name: new RegExp(`^Section ${n}: `) }));
const itemOf = (s: ReturnType<typeof section>, n: number) => within(s.getByRole('region', { name: `Item ${n}` }));

async function openSection(user: User, n: number) {
  await user.click(section(n).getByRole('button', { name: `Edit section ${n}` }));
  return section(n);
}

/** Replaces a box's text in one change, as a paste would (typing key by key re-draws the big form each time). */
async function retype(_user: User, box: HTMLElement, text: string) {
  fireEvent.change(box, { target: { value: text } });
  await waitFor(() => expect(box).toHaveValue(text));
}

async function openEditor(role: 'admin' | 'supervisor' = 'admin') {
  setViewportWidth(PHONE_WIDTH);
  localStorage.clear();
  const p = testPerson(role);
  mockApi({ 'GET /api/auth/me': p.me });
  const boatId = await seedBoatAndTemplates(p.seed);
  const [launch] = (await listRecords(p.ctx.db, p.ctx.clubId, 'checkTemplate')).filter((t) => t.fields.checkType === 'launch');
  const user = userEvent.setup();
  const view = renderApp('/admin/templates/launch', p.session);
  await screen.findByRole('heading', { name: 'Launch check template' });
  return { p, user, view, boatId, launch: launch! };
}

const launchVersions = async (p: ReturnType<typeof testPerson>) =>
  (await listRecords(p.ctx.db, p.ctx.clubId, 'checkTemplate')).filter((t) => t.fields.checkType === 'launch');

describe('the check template editor', () => {
  it('saves edits as a new version; the old version and the checks run against it do not change', async () => {
    const { p, user, view, boatId, launch } = await openEditor();
    // A launch check completed against version 1, with a critical item failed.
    const now = new Date().toISOString();
    const results = Object.fromEntries(DEFAULT_LAUNCH_TEMPLATE.sections.flatMap((s) => s.items).map((i) => [i.id, { outcome: 'pass' as const }]));
    const checkId = await createRecord(p.seed, 'check', {
      boatId, motorId: null, checkType: 'launch', templateId: launch.id, templateVersion: 1, startedAt: now, completedAt: now, status: 'complete',
      results: { ...results, 'drain-bungs': { outcome: 'fail' } }, performedBy: p.ctx.userId, signedOffBy: null, signedOffAt: null,
    });
    const checkBefore = (await getRecord(p.ctx.db, p.ctx.clubId, 'check', checkId))!.fields;

    // Rename the failed item and make it minor; move it to the top; remove one; add one.
    const hull = await openSection(user, 1);
    const bungs = itemOf(hull, 2);
    await retype(user, bungs.getByLabelText('What to check'), 'Drain bungs in, tight and secured');
    await user.click(bungs.getByRole('button', { name: 'Minor: a failure limits the boat' }));
    await user.click(bungs.getByRole('button', { name: 'Move item 2 up' }));
    expect(itemOf(section(1), 1).getByLabelText('What to check')).toHaveValue('Drain bungs in, tight and secured');
    const gear = await openSection(user, 5);
    expect(itemOf(gear, 5).getByLabelText('What to check')).toHaveValue('Whistle');
    await user.click(itemOf(gear, 5).getByRole('button', { name: 'Remove item 5' }));
    expect(await screen.findByText('Item 5 of section 5 removed.')).toBeInTheDocument();
    await user.click(section(5).getByRole('button', { name: 'Add an item to section 5' }));
    const added = itemOf(section(5), 5);
    await retype(user, added.getByLabelText('What to check'), 'Spare kill cord');
    await user.click(added.getByRole('combobox', { name: 'Answered by' }));
    await user.click(await screen.findByRole('option', { name: 'Count against a required number' }));
    await retype(user, itemOf(section(5), 5).getByLabelText('How many must be there'), '1');
    await retype(user, itemOf(section(5), 5).getByLabelText('Caution (optional)'), 'Clip it to the driver before starting.');
    expect(itemOf(section(5), 5).getByRole('note', { name: 'Caution of item 5' })).toHaveTextContent('Clip it to the driver before starting.');

    await user.click(screen.getByRole('button', { name: 'Save as version 2' }));
    expect(await screen.findByText(/Saved as version 2\./)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'No changes to save' })).toBeDisabled();

    const versions = await launchVersions(p);
    expect(versions).toHaveLength(2);
    const v1 = versions.find((v) => v.id === launch.id)!;
    const v2 = versions.find((v) => v.id !== launch.id)!;
    // The saved version is exactly as it was: the check keeps the items it was run against.
    expect(v1.fields).toEqual(launch.fields);
    expect(v2.fields.templateVersion).toBe(2);
    const v2Items = v2.fields.sections.flatMap((s) => s.items);
    expect(v2.fields.sections[0]!.items[0]).toEqual({ id: 'drain-bungs', label: 'Drain bungs in, tight and secured', kind: 'pass-fail', critical: false });
    expect(v2Items.find((i) => i.id === 'whistle')).toBeUndefined();
    expect(v2Items.find((i) => i.label === 'Spare kill cord')).toEqual({
      id: 'spare-kill-cord', label: 'Spare kill cord', kind: 'count', critical: false, required: 1, caution: 'Clip it to the driver before starting.',
    });
    expect((await getRecord(p.ctx.db, p.ctx.clubId, 'check', checkId))!.fields).toEqual(checkBefore);

    // The boat is still stood down by the item as version 1 had it: critical, with its old words.
    await view.router.navigate('/');
    const boat = within(await screen.findByRole('article', { name: 'IRB 2 · Gannet' }));
    expect(await boat.findByText('Stood down')).toBeInTheDocument();
    expect(boat.getByText(/^Stood down: Drain bungs in and secure failed/)).toBeInTheDocument();

    // A check started now runs against version 2.
    await view.router.navigate(`/checks/start?type=launch&boat=${boatId}`);
    await user.click(await screen.findByRole('button', { name: /launch check on Gannet/ }));
    await waitFor(() => expect(view.router.state.location.pathname).toMatch(/^\/checks\/run\//));
    const started = (await listRecords(p.ctx.db, p.ctx.clubId, 'check')).find((c) => c.id !== checkId)!;
    expect(started.fields).toMatchObject({ templateId: v2.id, templateVersion: 2 });
  }, 240_000);

  it('says what to fix, next to each box and in a list, and keeps everything typed when the save is refused', async () => {
    const { p, user } = await openEditor();
    // Sections open one at a time; a closed one lists its items.
    expect(section(1).getByText('Drain bungs in and secure · critical')).toBeInTheDocument();
    expect(section(1).queryByLabelText('What to check')).toBeNull();
    const gear = await openSection(user, 5);
    await retype(user, itemOf(gear, 1).getByLabelText('What to check'), '');
    await retype(user, itemOf(gear, 2).getByLabelText('How many must be there'), '0');
    await retype(user, gear.getByLabelText("Section title (the screen's heading)"), 'Rescue gear');
    await user.click(gear.getByRole('button', { name: 'Add an item to section 5' }));
    const reading = itemOf(section(5), 6);
    await retype(user, reading.getByLabelText('What to check'), 'Fuel in the spare can');
    await user.click(reading.getByRole('combobox', { name: 'Answered by' }));
    await user.click(await screen.findByRole('option', { name: 'Reading with a unit and range' }));
    await retype(user, itemOf(section(5), 6).getByLabelText('Lowest acceptable (blank: none)'), '20');
    await retype(user, itemOf(section(5), 6).getByLabelText('Highest acceptable (blank: none)'), '5');

    // Closed, the section still says it needs fixing once a save is tried, and opens again by itself.
    await user.click(section(5).getByRole('button', { name: 'Close section 5' }));
    await user.click(screen.getByRole('button', { name: 'Save as version 2' }));
    const summary = within(await screen.findByRole('alert'));
    expect(section(5).getByRole('button', { name: 'Close section 5' })).toBeInTheDocument();
    expect(section(5).getByText(/needs fixing/)).toBeInTheDocument();
    expect(section(2).getByRole('button', { name: 'Edit section 2' })).toBeInTheDocument();
    expect(summary.getByText(/4 things need fixing/)).toBeInTheDocument();
    expect(summary.getByRole('button', { name: /^Section 5 \(Rescue gear\), item 1: Say what to check/ })).toBeInTheDocument();
    expect(summary.getByRole('button', { name: /^Section 5 \(Rescue gear\), item 2 \(Paddles\): Enter how many must be in the boat/ })).toBeInTheDocument();
    expect(summary.getByRole('button', { name: /^Section 5 \(Rescue gear\), item 6 \(Fuel in the spare can\): Enter the unit/ })).toBeInTheDocument();
    expect(summary.getByRole('button', { name: /item 6 \(Fuel in the spare can\): The lowest must not be above the highest/ })).toBeInTheDocument();
    expect(itemOf(section(5), 2).getByText('Enter how many must be in the boat, a whole number from 1.')).toBeInTheDocument();
    expect(await launchVersions(p)).toHaveLength(1);
    // Everything typed is still there.
    expect(itemOf(section(5), 2).getByLabelText('How many must be there')).toHaveValue('0');
    expect(itemOf(section(5), 6).getByLabelText('What to check')).toHaveValue('Fuel in the spare can');
    expect(itemOf(section(5), 6).getByLabelText('Highest acceptable (blank: none)')).toHaveValue('5');

    // Fixing the boxes clears their messages as they are typed; then it saves.
    await retype(user, itemOf(section(5), 1).getByLabelText('What to check'), 'Rescue tube');
    await retype(user, itemOf(section(5), 2).getByLabelText('How many must be there'), '2');
    await retype(user, itemOf(section(5), 6).getByLabelText('Unit'), 'L');
    await retype(user, itemOf(section(5), 6).getByLabelText('Lowest acceptable (blank: none)'), '5');
    await retype(user, itemOf(section(5), 6).getByLabelText('Highest acceptable (blank: none)'), '20');
    expect(screen.queryByRole('alert')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Save as version 2' }));
    expect(await screen.findByText(/Saved as version 2\./)).toBeInTheDocument();
    const v2 = (await launchVersions(p)).find((v) => v.fields.templateVersion === 2)!;
    expect(v2.fields.sections[4]!.title).toBe('Rescue gear');
    expect(v2.fields.sections[4]!.items[5]).toEqual({ id: 'fuel-in-the-spare-can', label: 'Fuel in the spare can', kind: 'reading', critical: false, unit: 'L', min: 5, max: 20 });
  }, 240_000);

  it('keeps unsaved edits on the phone through a reload, until they are discarded', async () => {
    const { p, user, view } = await openEditor();
    await retype(user, screen.getByLabelText('Name of the check'), 'Morning launch check');
    view.unmount();
    renderApp('/admin/templates/launch', p.session);
    expect(await screen.findByLabelText('Name of the check')).toHaveValue('Morning launch check');
    await user.click(screen.getByRole('button', { name: 'Discard changes' }));
    expect(screen.getByLabelText('Name of the check')).toHaveValue('Launch check');
    expect(await launchVersions(p)).toHaveLength(1);
  }, 120_000);

  it('shows a supervisor the template to read, with no way to save', { timeout: 60_000 }, async () => {
    await openEditor('supervisor');
    expect(screen.getByText(/Only an admin may change it/)).toBeInTheDocument();
    expect(screen.getByLabelText('Name of the check')).toBeDisabled();
    expect(screen.queryByRole('button', { name: /Save as version/ })).toBeNull();
  });

  it('lists the versions and how many checks ran against each', async () => {
    const { p, user, boatId, launch } = await openEditor();
    const now = new Date().toISOString();
    await createRecord(p.seed, 'check', {
      boatId, motorId: null, checkType: 'launch', templateId: launch.id, templateVersion: 1, startedAt: now, completedAt: null, status: 'in-progress',
      results: {}, performedBy: p.ctx.userId, signedOffBy: null, signedOffAt: null,
    });
    await retype(user, screen.getByLabelText('Name of the check'), 'Launch check (surf)');
    await user.click(screen.getByRole('button', { name: 'Save as version 2' }));
    await screen.findByText(/Saved as version 2\./);
    renderApp('/admin/templates', p.session);
    const list = within(await screen.findByRole('list', { name: 'Launch check versions' }));
    expect(list.getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'Version 2 (in use)6 sections, 23 items · run by 0 checks · not sent yet',
      'Version 1 6 sections, 23 items · run by 1 check · not sent yet'.replace('1 6', '16'),
    ]);
  }, 120_000);
});
