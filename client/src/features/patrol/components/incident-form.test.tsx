import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, incidentFields, tripFields } from '../testing/records';

function stubLocation(answer: { coords?: { latitude: number; longitude: number; accuracy: number }; code?: number }) {
  const geolocation = {
    getCurrentPosition: vi.fn((ok: PositionCallback, fail: PositionErrorCallback) => {
      if (answer.coords) ok({ coords: answer.coords, timestamp: 0 } as unknown as GeolocationPosition);
      else fail({ code: answer.code!, PERMISSION_DENIED: 1, POSITION_UNAVAILABLE: 2, TIMEOUT: 3, message: '' } as GeolocationPositionError);
    }),
  };
  Object.defineProperty(navigator, 'geolocation', { value: geolocation, configurable: true });
  return geolocation;
}

async function scene(role: 'driver' | 'crew') {
  setViewportWidth(PHONE_WIDTH);
  const p = testPerson(role);
  mockApi({ 'GET /api/auth/me': p.me });
  const boatId = await createRecord(p.seed, 'boat', boatFields());
  const tripId = await createRecord(p.seed, 'trip', tripFields({ boatId, motorId: null, launchedAt: new Date(Date.now() - 20 * 60_000).toISOString() }));
  return { p, boatId, tripId };
}

describe('an incident note', () => {
  afterEach(() => { delete (navigator as { geolocation?: unknown }).geolocation; });

  it('says it holds health information, takes the phone\'s position when allowed, and saves linked to the trip', async () => {
    const { p, boatId, tripId } = await scene('driver');
    const geo = stubLocation({ coords: { latitude: -33.287123456, longitude: 151.572349876, accuracy: 11.6 } });
    const user = userEvent.setup({ delay: null });
    renderApp(`/trips/${tripId}/incidents/new`, p.session);
    const form = within(await screen.findByRole('form', { name: 'Incident note' }, { timeout: 10_000 }));
    expect(form.getByText('This note can hold health information')).toBeInTheDocument();
    expect(form.getByText(/Write only what is needed.*does not replace the incident report your governing body requires/)).toBeInTheDocument();

    await user.click(form.getByRole('button', { name: 'Save incident note' }));
    expect(form.getByText('Choose what kind of incident it was.')).toBeInTheDocument();
    expect(form.getByText('Say what was done.')).toBeInTheDocument();
    // The position is asked for only on the tap.
    expect(geo.getCurrentPosition).not.toHaveBeenCalled();
    await user.click(form.getByRole('button', { name: "Add this phone's location" }));
    expect(form.getByText('33.28712° S, 151.57235° E')).toBeInTheDocument();
    expect(form.getByText(/WGS 84 latitude and longitude as the phone's location service gave them, to within about 12 m/)).toBeInTheDocument();

    await user.click(form.getByRole('button', { name: 'Rescue' }));
    await user.type(form.getByLabelText('People helped'), '2');
    await user.type(form.getByLabelText('What was done'), 'Two swimmers taken aboard from the rip');
    await user.type(form.getByLabelText('Outcome'), 'Handed to the first aid room');
    await user.click(form.getByRole('button', { name: 'Save incident note' }));

    expect(await screen.findByRole('heading', { name: 'Trip · Patrol' }, { timeout: 10_000 })).toBeInTheDocument();
    const notes = within(await screen.findByRole('list', { name: 'Incident notes' }));
    expect(notes.getByText(/^Rescue · .* · 2 people helped$/)).toBeInTheDocument();
    const [note] = await listRecords(p.ctx.db, p.ctx.clubId, 'incidentNote');
    expect(note!.fields).toMatchObject({
      tripId, boatId, kind: 'rescue', peopleHelped: 2, lat: -33.28712, lon: 151.57235, authorId: p.ctx.userId,
      actionTaken: 'Two swimmers taken aboard from the rip', outcome: 'Handed to the first aid room', text: '',
    });
  }, 90_000);

  it('saves without a place when the person does not allow it, and says so', async () => {
    const { p, tripId } = await scene('crew');
    stubLocation({ code: 1 });
    const user = userEvent.setup({ delay: null });
    renderApp(`/trips/${tripId}/incidents/new`, p.session);
    const form = within(await screen.findByRole('form', { name: 'Incident note' }, { timeout: 10_000 }));
    await user.click(form.getByRole('button', { name: "Add this phone's location" }));
    expect(form.getByText(/Location was not allowed on this phone, so none is saved/)).toBeInTheDocument();
    await user.click(form.getByRole('button', { name: 'Near miss' }));
    await user.type(form.getByLabelText('What was done'), 'Motor killed when a swimmer surfaced beside the boat');
    await user.click(form.getByRole('button', { name: 'Save incident note' }));
    await waitFor(async () => expect(await listRecords(p.ctx.db, p.ctx.clubId, 'incidentNote')).toHaveLength(1));
    const [note] = await listRecords(p.ctx.db, p.ctx.clubId, 'incidentNote');
    expect(note!.fields).toMatchObject({ kind: 'near-miss', lat: null, lon: null, peopleHelped: 0, authorId: p.ctx.userId });
  }, 90_000);

  it('shows a crew member only the notes they wrote', async () => {
    const { p, boatId, tripId } = await scene('crew');
    await createRecord(p.seed, 'incidentNote', incidentFields({ tripId, boatId, authorId: p.ctx.userId, actionTaken: 'My own note' }));
    await createRecord({ ...p.seed, userId: 'u-ana' }, 'incidentNote', incidentFields({ tripId, boatId, authorId: 'u-ana', actionTaken: 'A driver\'s note' }));
    renderApp(`/trips/${tripId}`, p.session);
    const notes = within(await screen.findByRole('list', { name: 'Incident notes' }, { timeout: 10_000 }));
    expect(notes.getByText('My own note')).toBeInTheDocument();
    expect(notes.queryByText("A driver's note")).toBeNull();
  }, 40_000);
});
