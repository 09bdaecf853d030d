import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { mockApi, type RecordedCall } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { DESKTOP_WIDTH, setViewportWidth } from '@/test/viewport';
import { tokenStore } from '@/features/auth/token-store';

const SLOW = { timeout: 30_000 };

async function placeBeach(form: ReturnType<typeof within>, user: ReturnType<typeof userEvent.setup>) {
  // Invented beach; the test person's session carries no location, as a session saved by an older app.
  await user.clear(form.getByLabelText('Latitude (°)'));
  await user.type(form.getByLabelText('Latitude (°)'), '-34.05');
  await user.clear(form.getByLabelText('Longitude (°)'));
  await user.type(form.getByLabelText('Longitude (°)'), '151.15');
}

function atAdmin(patch: (call: RecordedCall) => { status: number; body?: unknown }) {
  setViewportWidth(DESKTOP_WIDTH);
  const p = testPerson('admin');
  const sent: RecordedCall[] = [];
  let club = { ...p.session.activeClub };
  mockApi({
    'GET /api/auth/me': () => ({ status: 200, body: { user: p.session.user, activeClub: club, memberships: p.session.memberships } }),
    'GET /api/members': { status: 200, body: [] },
    'GET /api/invites': { status: 200, body: [] },
    'GET /api/dev/mail': { status: 404, body: { statusCode: 404, code: 'not_found', message: 'off' } },
    'PATCH /api/clubs/current': (call) => {
      sent.push(call);
      const answer = patch(call);
      if (answer.status === 200) club = { ...club, ...(call.body as object) };
      return answer;
    },
  });
  renderApp('/admin', p.session);
  return { sent, user: userEvent.setup() };
}

describe('club settings on the Admin page', { timeout: 90_000 }, () => {
  it('saves the award check and units, and this device uses them at once', async () => {
    const { sent, user } = atAdmin(() => ({ status: 200, body: {} }));
    const form = within(await screen.findByRole('form', { name: 'Club settings' }, SLOW));
    await placeBeach(form, user);
    await user.click(form.getByRole('combobox', { name: 'Signing on without a current award' }));
    await user.click(await screen.findByRole('option', { name: 'Refuse the sign-on' }));
    await user.click(form.getByRole('combobox', { name: 'Pressure unit' }));
    await user.click(await screen.findByRole('option', { name: 'psi' }));
    await user.click(form.getByRole('button', { name: 'Save club settings' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.body).toMatchObject({ awardCheck: 'block', pressureUnit: 'psi', latitude: -34.05, longitude: 151.15 });
    expect(await form.findByText('Saved. This device uses the new settings now.')).toBeInTheDocument();
    await waitFor(() => expect(tokenStore.getState().session?.activeClub).toMatchObject({ awardCheck: 'block', pressureUnit: 'psi' }));
  });

  it("puts the server's words beside a refused time zone and keeps what was typed", async () => {
    const { user } = atAdmin(() => ({
      status: 400,
      body: { statusCode: 400, code: 'validation_failed', message: 'Check the settings.', details: [{ field: 'timeZone', message: 'Give the time zone by its IANA name, such as Australia/Sydney or Pacific/Auckland.' }] },
    }));
    const form = within(await screen.findByRole('form', { name: 'Club settings' }, SLOW));
    await placeBeach(form, user);
    const zone = form.getByLabelText('Time zone (IANA name)');
    await user.clear(zone);
    await user.type(zone, 'Sydney');
    await user.click(form.getByRole('button', { name: 'Save club settings' }));
    expect(await form.findByText(/by its IANA name/)).toBeInTheDocument();
    expect(zone).toHaveValue('Sydney');
  });

  it('asks for a latitude before sending anything', async () => {
    const { sent, user } = atAdmin(() => ({ status: 200, body: {} }));
    const form = within(await screen.findByRole('form', { name: 'Club settings' }, SLOW));
    await user.clear(form.getByLabelText('Latitude (°)'));
    await user.click(form.getByRole('button', { name: 'Save club settings' }));
    expect(form.getByText(/Give the latitude in degrees/)).toBeInTheDocument();
    expect(sent).toEqual([]);
  });
});
