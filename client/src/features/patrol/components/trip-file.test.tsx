import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { getRecord } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, memberFields, motorFields, tripFields } from '../testing/records';

// The place of the USNO values in checks.md (Melbourne): 2026-06-21 sunset 07:08Z.
const MELBOURNE = { timeZone: 'Australia/Melbourne', latitude: -37.814, longitude: 144.96332, windUnit: 'kn' };

async function scene(role: 'driver' | 'crew') {
  setViewportWidth(PHONE_WIDTH);
  const p = testPerson(role);
  const session = { ...p.session, activeClub: { ...p.session.activeClub, ...MELBOURNE } };
  mockApi({ 'GET /api/auth/me': { status: 200, body: { ...p.me.body, activeClub: session.activeClub } } });
  const boatId = await createRecord(p.seed, 'boat', boatFields());
  const motorId = await createRecord(p.seed, 'motor', motorFields({ boatId, premixRatio: 50, hourMeter: 140 }));
  await createRecord(p.seed, 'member', memberFields('u-sam', 'Sam Whitcombe'));
  // Launched 17:20 AEST, after sunset; back at 18:05.
  const tripId = await createRecord(p.seed, 'trip', tripFields({
    boatId, motorId, driverId: p.ctx.userId, crewIds: ['u-sam'], purpose: 'search', launchedAt: '2026-06-21T07:20:00Z', retrievedAt: '2026-06-21T08:05:00Z',
  }));
  return { p, session, tripId, motorId };
}

describe('a trip', () => {
  it('shows its times, the time on the water and the daylight warning', async () => {
    const { session, tripId } = await scene('driver');
    renderApp(`/trips/${tripId}`, session);
    expect(await screen.findByRole('heading', { name: 'Trip · Search' }, { timeout: 10_000 })).toBeInTheDocument();
    const times = within(screen.getByRole('region', { name: 'Times' }));
    expect(times.getByText('17:20')).toBeInTheDocument();
    expect(times.getByText('18:05')).toBeInTheDocument();
    expect(times.getByText('45 min')).toBeInTheDocument();
    expect(screen.getByText(/^Launch at 17:20 is outside daylight: at the club on 2026-06-21 the sun rises at 07:3\d and sets at 17:0\d\./)).toBeInTheDocument();
    const log = within(screen.getByRole('region', { name: 'Trip log' }));
    expect(log.getByText('Sam Whitcombe')).toBeInTheDocument();
  }, 40_000);

  it('adds readings after retrieval with the scales and premix shown, and keeps the reason for a correction', async () => {
    const { p, session, tripId, motorId } = await scene('driver');
    const user = userEvent.setup({ delay: null });
    renderApp(`/trips/${tripId}`, session);
    expect(await screen.findByText('Not recorded yet: wind, waves, engine hours. Add them while you remember.', {}, { timeout: 10_000 })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add conditions and readings' }));
    let form = within(screen.getByRole('form', { name: 'Edit trip' }));
    await user.type(form.getByLabelText('Wind speed'), '12');
    // Met Office Fact sheet 6: 11–16 kn is force 4, moderate breeze
    expect(form.getByText('12 kn · Beaufort force 4, moderate breeze')).toBeInTheDocument();
    await user.type(form.getByLabelText('Wave height'), '1.2');
    // WMO code table 3700: 0.5–1.25 m is code 3, slight
    expect(form.getByText('1.2 m · sea state 3, slight')).toBeInTheDocument();
    await user.type(form.getByLabelText('Fuel added'), '20');
    // checks.md premix: 20 L at 50:1 is 400 mL petrol-to-oil, 392.16 mL of a 20 L total mix
    const premix = within(form.getByRole('region', { name: 'Premix oil' }));
    expect(premix.getByText('Into 20 L of petrol: 400 mL of two-stroke oil')).toBeInTheDocument();
    expect(premix.getByText('For 20 L of mix in all: 392 mL of two-stroke oil with 19.61 L of petrol')).toBeInTheDocument();
    await user.type(form.getByLabelText('Engine hours at launch'), '140');
    await user.type(form.getByLabelText('Engine hours at retrieval'), '140.8');
    // Filling in what was not recorded is not a correction: no reason is asked.
    await user.click(form.getByRole('button', { name: 'Save trip' }));
    await waitFor(() => expect(screen.queryByRole('form', { name: 'Edit trip' })).toBeNull());
    const log = within(screen.getByRole('region', { name: 'Trip log' }));
    expect(await log.findByText('12 kn · Beaufort force 4, moderate breeze')).toBeInTheDocument();
    expect(log.getByText('1.2 m · sea state 3, slight')).toBeInTheDocument();
    expect(log.getByText('140 h → 140.8 h (0.8 h run)')).toBeInTheDocument();
    // The meter reading at retrieval moves the motor's hour meter on, for its service forecast.
    await waitFor(async () => expect((await getRecord(p.ctx.db, p.ctx.clubId, 'motor', motorId))!.fields.hourMeter).toBe(140.8));

    await user.click(log.getByRole('button', { name: 'Edit this trip' }));
    form = within(screen.getByRole('form', { name: 'Edit trip' }));
    await user.clear(form.getByLabelText('Wind speed'));
    await user.type(form.getByLabelText('Wind speed'), '18');
    await user.click(form.getByRole('button', { name: 'Save trip' }));
    expect(await form.findByText(/Say why this logged trip is being changed/)).toBeInTheDocument();
    await user.type(form.getByLabelText('Reason for the change (kept with the trip)'), 'Misread the gauge');
    await user.click(form.getByRole('button', { name: 'Save trip' }));
    expect(await within(screen.getByRole('region', { name: 'Changes after logging' })).findByText('Misread the gauge (changed: wind speed)')).toBeInTheDocument();
    const trip = await getRecord(p.ctx.db, p.ctx.clubId, 'trip', tripId);
    expect(trip!.fields).toMatchObject({ windSpeedKn: 18, waveHeightM: 1.2, fuelAddedL: 20, engineHoursStart: 140, engineHoursEnd: 140.8 });
    expect(trip!.fields.editReasons.map((r) => [r.by, r.text])).toEqual([[p.ctx.userId, 'Misread the gauge (changed: wind speed)']]);
  }, 90_000);

  it('asks which time is meant when a typed time happened twice, never picking one', async () => {
    const { p, session } = await scene('driver');
    const boat = await createRecord(p.seed, 'boat', boatFields({ fleetNumber: 'IRB 2', name: 'Skua' }));
    // IANA tz database 2026c: Melbourne, like Sydney, goes back at 03:00 on 5 Apr 2026, so 02:30 happens twice.
    const tripId = await createRecord(p.seed, 'trip', tripFields({ boatId: boat, motorId: null, driverId: p.ctx.userId, launchedAt: '2026-04-04T14:50:00Z', retrievedAt: null }));
    const user = userEvent.setup({ delay: null });
    renderApp(`/trips/${tripId}`, session);
    await user.click(await screen.findByRole('button', { name: 'Add conditions and readings' }, { timeout: 10_000 }));
    const form = within(screen.getByRole('form', { name: 'Edit trip' }));
    await user.type(form.getByLabelText('Retrieval date'), '2026-04-05');
    await user.type(form.getByLabelText('Retrieval time'), '02:30');
    await user.click(form.getByRole('button', { name: 'Save trip' }));
    const question = within(await form.findByRole('alert'));
    expect(question.getByText(/02:30 happened twice on 2026-04-05/)).toBeInTheDocument();
    expect((await getRecord(p.ctx.db, p.ctx.clubId, 'trip', tripId))!.fields.retrievedAt).toBeNull();
    await user.click(question.getByLabelText('02:30 at UTC+10:00, the second time (after the clocks went back)'));
    await user.click(form.getByRole('button', { name: 'Save trip' }));
    await waitFor(async () => expect((await getRecord(p.ctx.db, p.ctx.clubId, 'trip', tripId))!.fields.retrievedAt).toBe('2026-04-04T16:30:00.000Z'));
  }, 60_000);

  it('lets a crew member read a trip but not change it', async () => {
    const { session, tripId } = await scene('crew');
    renderApp(`/trips/${tripId}`, session);
    expect(await screen.findByRole('heading', { name: 'Trip · Search' }, { timeout: 10_000 })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Edit this trip' })).toBeNull();
    expect(screen.getByRole('link', { name: 'Add an incident note' })).toBeInTheDocument();
  }, 40_000);
});
