import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE, addDays, addMonthsClamped, utcToLocal } from '@breakline/sync-protocol';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { testPerson } from '@/test/test-person';
import { boatFields, motorFields, passedResults } from '../testing/records';
import { dayWords } from './service-words';

type Person = ReturnType<typeof testPerson>;
const ZONE = 'Australia/Sydney';
// The screens use the real clock, so the dates here are counted from today in the club's zone.
const today = () => utcToLocal(new Date().toISOString(), ZONE).date;
const noonOn = (date: string) => `${date}T02:00:00Z`;

async function boatWithMotor(p: Person, serviceDaysAgo: number, hourMeter = 120) {
  const boatId = await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 2', name: 'Gannet' }));
  const motorId = await createRecord(p.seed, 'motor', motorFields({ boatId, hourMeter, lastServiceAt: null, lastServiceHours: null }));
  const servicedOn = addDays(today(), -serviceDaysAgo);
  await createRecord(p.seed, 'serviceRecord', {
    motorId, servicedAt: noonOn(servicedOn), engineHours: 100, work: 'Gearbox oil and plugs', parts: 'Plugs ×2', performedBy: 'Gannet Bay Marine',
  });
  return { boatId, motorId, servicedOn };
}

describe('a motor’s Service section', () => {
  it('says when service falls due, whichever comes first, and lists the history', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const { motorId, servicedOn } = await boatWithMotor(p, 10);
    renderApp(`/fleet/motors/${motorId}`, p.session);
    const section = within(await screen.findByRole('region', { name: 'Service' }));
    expect(await section.findByText('Service not yet due')).toBeInTheDocument();
    // 100 h at the service, 100 h interval, hour meter 120 h: 80 h left; 12-month interval.
    const due = dayWords(addMonthsClamped(servicedOn, 12));
    expect(section.getByText(`Due in 80.0 engine hours or on ${due}, whichever comes first.`)).toBeInTheDocument();
    expect(section.getByText('No engine hours logged on trips in the last 30 days, so no forecast from use.')).toBeInTheDocument();
    expect(section.getByText(/kill cord removed/)).toBeInTheDocument();
    const history = within(section.getByRole('list', { name: 'Service history' }));
    expect(history.getByText(`${dayWords(servicedOn)} at 100.0 h · Gearbox oil and plugs`)).toBeInTheDocument();
    expect(history.getByText('Parts: Plugs ×2 · by Gannet Bay Marine · not sent yet')).toBeInTheDocument();
    // Only supervisors record services.
    expect(section.queryByRole('button', { name: 'Record a service' })).toBeNull();
  });

  it('shows overdue as a word and a mark on the motor page and the fleet page', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const { motorId } = await boatWithMotor(p, 10, 203);
    const view = renderApp(`/fleet/motors/${motorId}`, p.session);
    const section = within(await screen.findByRole('region', { name: 'Service' }));
    expect(await section.findByText('Service overdue')).toBeInTheDocument();
    expect(section.getByText('Overdue: 3.0 engine hours past the 200.0 h service.')).toBeInTheDocument();
    expect(document.querySelector('[data-service-icon="overdue"]')).not.toBeNull();

    await view.router.navigate('/fleet');
    const motors = within(await screen.findByRole('list', { name: 'Motors' }));
    expect(await motors.findByText('Service overdue')).toBeInTheDocument();
    expect(motors.getByText('Fitted to Gannet')).toBeInTheDocument();
  });

  it('lets a supervisor record a service, keeping what was typed while a box needs fixing', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('supervisor');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const { motorId } = await boatWithMotor(p, 300, 195);
    const user = userEvent.setup();
    renderApp(`/fleet/motors/${motorId}`, p.session);
    const section = within(await screen.findByRole('region', { name: 'Service' }));
    expect(await section.findByText('Service due soon')).toBeInTheDocument();
    await user.click(section.getByRole('button', { name: 'Record a service' }));
    const form = within(section.getByRole('form', { name: 'Record a service' }));
    expect(form.getByLabelText('Hour meter at the service (h)')).toHaveValue('195');
    await user.type(form.getByLabelText('Work done'), 'Impeller replaced, gearbox oil changed');
    await user.type(form.getByLabelText('Parts fitted'), 'Impeller kit');
    await user.click(form.getByRole('button', { name: 'Save the service' }));
    expect(await form.findByText('Enter who did the service (a member or an outside mechanic).')).toBeInTheDocument();
    expect(form.getByText('Some boxes need fixing before the service is saved.')).toBeInTheDocument();
    expect(form.getByLabelText('Work done')).toHaveValue('Impeller replaced, gearbox oil changed');
    expect(await listRecords(p.ctx.db, p.ctx.clubId, 'serviceRecord')).toHaveLength(1);

    await user.type(form.getByLabelText('Done by'), 'Gear officer');
    await user.click(form.getByRole('button', { name: 'Save the service' }));
    await waitFor(() => expect(section.queryByRole('form', { name: 'Record a service' })).toBeNull());
    const saved = (await listRecords(p.ctx.db, p.ctx.clubId, 'serviceRecord')).map((r) => r.fields).filter((f) => f.engineHours === 195);
    expect(saved).toEqual([
      { motorId, servicedAt: expect.any(String), engineHours: 195, work: 'Impeller replaced, gearbox oil changed', parts: 'Impeller kit', performedBy: 'Gear officer' },
    ]);
    expect(utcToLocal(saved[0]!.servicedAt, ZONE).date).toBe(today());
    // Counted from the new service: 195 h + 100 h = 295 h, 100.0 h left.
    expect(await section.findByText('Service not yet due')).toBeInTheDocument();
    expect(section.getByText(`Due in 100.0 engine hours or on ${dayWords(addMonthsClamped(today(), 12))}, whichever comes first.`)).toBeInTheDocument();
    const history = within(section.getByRole('list', { name: 'Service history' }));
    expect(history.getAllByRole('listitem')[0]).toHaveTextContent(`${dayWords(today())} at 195.0 h · Impeller replaced, gearbox oil changed`);
  }, 30_000);
});

describe('a motor’s record beside its service history', () => {
  it('says on the motor’s own boxes when the history holds a later service and a higher hour meter', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('supervisor');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const boatId = await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 2', name: 'Gannet' }));
    // The motor's record says 90 h at a service 200 days ago; the history has one at 140 h, 20 days ago.
    const motorId = await createRecord(p.seed, 'motor', motorFields({
      boatId, hourMeter: 120, lastServiceAt: noonOn(addDays(today(), -200)), lastServiceHours: 90,
    }));
    const servicedOn = addDays(today(), -20);
    await createRecord(p.seed, 'serviceRecord', {
      motorId, servicedAt: noonOn(servicedOn), engineHours: 140, work: 'Plugs and impeller', parts: '', performedBy: 'Gear officer',
    });
    renderApp(`/fleet/motors/${motorId}`, p.session);
    expect(await screen.findByText(
      `The service history below has a later one: ${dayWords(servicedOn)} at 140.0 h. The due counts from that; these two boxes keep a service from before the history.`,
    )).toBeInTheDocument();
    expect(screen.getByText('Trips and services have logged up to 140.0 h; the due counts from that.')).toBeInTheDocument();
    expect(screen.getByLabelText('Hour meter (h)')).toHaveValue('120');
  });

  it('says nothing on the motor’s boxes when its record is the latest word', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('supervisor');
    mockApi({ 'GET /api/auth/me': p.me, 'GET /api/members': { status: 200, body: [] } });
    const motorId = await createRecord(p.seed, 'motor', motorFields({ boatId: null, hourMeter: 120, lastServiceAt: noonOn(addDays(today(), -5)), lastServiceHours: 118 }));
    renderApp(`/fleet/motors/${motorId}`, p.session);
    const section = within(await screen.findByRole('region', { name: 'Service' }));
    expect(await section.findByText(`Last service ${dayWords(addDays(today(), -5))} at 118.0 h · hour meter now 120.0 h`)).toBeInTheDocument();
    expect(screen.queryByText(/The service history below has a later one/)).toBeNull();
    expect(screen.queryByText(/Trips and services have logged up to/)).toBeNull();
  });
});

describe('Today with a motor past its service', () => {
  it('shows the boat limited, with the motor’s service as the reason', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    // Serviced 400 days ago on a 12-month interval: overdue by date.
    const { boatId } = await boatWithMotor(p, 400);
    const templateId = await createRecord(p.seed, 'checkTemplate', DEFAULT_LAUNCH_TEMPLATE);
    const now = new Date().toISOString();
    await createRecord(p.seed, 'check', {
      boatId, motorId: null, checkType: 'launch', templateId, templateVersion: 1, startedAt: now, completedAt: now,
      status: 'complete', results: passedResults(DEFAULT_LAUNCH_TEMPLATE), performedBy: p.ctx.userId, signedOffBy: null, signedOffAt: null,
    });
    renderApp('/', p.session);
    const gannet = within(await screen.findByRole('article', { name: 'IRB 2 · Gannet' }));
    expect(await gannet.findByText('Limited')).toBeInTheDocument();
    expect(gannet.getByText(/^Limited: motor service overdue: 80\.0 h left before the 200\.0 h service; due on \d{4}-\d{2}-\d{2}, \d+ days ago/)).toBeInTheDocument();
  });
});
