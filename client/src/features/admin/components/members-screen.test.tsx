import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { mockApi, type RecordedCall } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { testPerson } from '@/test/test-person';
import { DESKTOP_WIDTH, setViewportWidth } from '@/test/viewport';

const SLOW = { timeout: 30_000 };

// Invented members of an invented club.
function members(adminId: string) {
  return [
    { membershipId: 'm-1', userId: adminId, displayName: 'Ria Okafor', email: 'ria.okafor@example.org', role: 'admin' },
    { membershipId: 'm-2', userId: 'u-2', displayName: 'Sam Whitcombe', email: 'sam@example.org', role: 'crew' },
  ];
}

const invite = (over: Record<string, unknown> = {}) => ({
  id: 'i-1', email: 'new.crew@example.org', role: 'crew', status: 'pending', invitedBy: { id: 'u-1', name: 'Ria Okafor' },
  createdAt: '2026-12-01T00:00:00.000Z', expiresAt: '2026-12-08T00:00:00.000Z', acceptedAt: null, ...over,
});

function atAdmin(extra: Record<string, unknown> = {}) {
  setViewportWidth(DESKTOP_WIDTH);
  const p = testPerson('admin');
  const sent: RecordedCall[] = [];
  const api = mockApi({
    'GET /api/auth/me': p.me,
    'GET /api/members': { status: 200, body: members(p.ctx.userId) },
    'GET /api/invites': { status: 200, body: [invite(), invite({ id: 'i-2', email: 'old@example.org', status: 'expired' })] },
    'GET /api/dev/mail': { status: 200, body: [] },
    'POST /api/invites': (call) => { sent.push(call); return { status: 201, body: invite({ id: 'i-3', email: (call.body as { email: string }).email }) }; },
    'PATCH /api/members/m-2': (call) => { sent.push(call); return { status: 200, body: { ...members(p.ctx.userId)[1], role: (call.body as { role: string }).role } }; },
    ...extra,
  });
  renderApp('/admin', p.session);
  return { p, api, sent, user: userEvent.setup() };
}

describe('members, invitations and roles', { timeout: 90_000 }, () => {
  it('invites by e-mail with a role', async () => {
    const { sent, user } = atAdmin();
    const form = within(await screen.findByRole('form', { name: 'Invite a member' }, SLOW));
    await user.click(form.getByLabelText('E-mail address'));
    await user.paste('not an address');
    await user.click(form.getByRole('button', { name: 'Send invitation' }));
    expect(form.getByText('Enter an e-mail address such as name@example.org.')).toBeInTheDocument();
    expect(sent).toEqual([]);

    await user.clear(form.getByLabelText('E-mail address'));
    await user.click(form.getByLabelText('E-mail address'));
    await user.paste('kai.ng@example.org');
    await user.click(form.getByRole('combobox', { name: 'Role' }));
    await user.click(await screen.findByRole('option', { name: 'Driver' }));
    await user.click(form.getByRole('button', { name: 'Send invitation' }));
    await waitFor(() => expect(sent.map((c) => c.body)).toEqual([{ email: 'kai.ng@example.org', role: 'driver' }]));
    expect(await form.findByText('Invitation sent to kai.ng@example.org. It is listed below until they accept it.')).toBeInTheDocument();
  });

  it("shows the server's words for an address it refuses, beside the box", async () => {
    const { user } = atAdmin({
      'POST /api/invites': { status: 409, body: { statusCode: 409, code: 'conflict', message: 'kai.ng@example.org is already a member.', details: [{ field: 'email', message: 'This person is already a member of the club.' }] } },
    });
    const form = within(await screen.findByRole('form', { name: 'Invite a member' }, SLOW));
    await user.click(form.getByLabelText('E-mail address'));
    await user.paste('kai.ng@example.org');
    await user.click(form.getByRole('button', { name: 'Send invitation' }));
    expect(await form.findByText('This person is already a member of the club.')).toBeInTheDocument();
  });

  it('lists invitations with their state and lets a waiting one be withdrawn', async () => {
    atAdmin();
    const table = within(await screen.findByRole('table', { name: 'Invitations' }, SLOW));
    expect(table.getByRole('row', { name: /new\.crew@example\.org Crew Waiting for them to accept Ria Okafor/ })).toBeInTheDocument();
    expect(table.getByRole('row', { name: /old@example\.org Crew Expired: send a new one/ })).toBeInTheDocument();
    expect(table.getByRole('button', { name: 'Withdraw the invitation to new.crew@example.org' })).toBeInTheDocument();
    expect(table.queryByRole('button', { name: 'Withdraw the invitation to old@example.org' })).not.toBeInTheDocument();
  });

  it("changes a member's role, and asks first before an admin gives up their own", async () => {
    const { sent, user } = atAdmin();
    const table = within(await screen.findByRole('table', { name: 'Members' }, SLOW));
    await user.click(table.getByRole('combobox', { name: 'Role of Sam Whitcombe' }));
    await user.click(await screen.findByRole('option', { name: 'Supervisor' }));
    await waitFor(() => expect(sent.map((c) => [c.method, c.path, c.body])).toEqual([['PATCH', '/api/members/m-2', { role: 'supervisor' }]]));
    expect(await screen.findByText(/Sam Whitcombe is now supervisor/)).toBeInTheDocument();

    await user.click(table.getByRole('combobox', { name: 'Role of Ria Okafor' }));
    await user.click(await screen.findByRole('option', { name: 'Crew' }));
    expect(await screen.findByRole('dialog', { name: 'Give up your admin role?' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Keep my role' }));
    expect(sent).toHaveLength(1);
  });

  it('links to the caught mail only when the server runs the mail catcher', async () => {
    atAdmin();
    expect(await screen.findByRole('link', { name: 'Read caught mail' }, SLOW)).toBeInTheDocument();
  });

  it('has no caught-mail link on a server that sends real e-mail', async () => {
    atAdmin({ 'GET /api/dev/mail': { status: 404, body: { statusCode: 404, code: 'not_found', message: 'The caught-mail page is on only while the local mail catcher runs (npm start or npm test); this server sends real e-mail.' } } });
    await screen.findByRole('table', { name: 'Members' }, SLOW);
    await waitFor(() => expect(screen.queryByRole('link', { name: 'Read caught mail' })).not.toBeInTheDocument());
  });
});

describe('caught mail', { timeout: 90_000 }, () => {
  it('lists what the catcher caught and shows a message with its links', async () => {
    setViewportWidth(DESKTOP_WIDTH);
    const p = testPerson('admin');
    mockApi({
      'GET /api/auth/me': p.me,
      'GET /api/dev/mail': { status: 200, body: [
        { id: 'a', to: ['kai.ng@example.org'], subject: 'Join Saltmarsh Heads Surf Club on Breakline', text: 'Open http://127.0.0.1:3000/accept-invite#token=abc to join.', at: '2026-12-06T00:00:00.000Z', tag: 'invite' },
        { id: 'b', to: ['captain@example.org'], subject: 'Stand-down: IRB 2 Gannet', text: 'A stand-down defect was reported.', at: '2026-12-05T00:00:00.000Z', tag: 'alert' },
      ] },
    });
    const user = userEvent.setup();
    renderApp('/admin/mail', p.session);
    const list = within(await screen.findByRole('list', { name: 'Caught e-mails' }, SLOW));
    const message = within(screen.getByRole('article', { name: 'The e-mail' }));
    expect(message.getByRole('link', { name: 'http://127.0.0.1:3000/accept-invite#token=abc' })).toBeInTheDocument();
    await user.click(list.getByText('Stand-down: IRB 2 Gannet'));
    expect(await message.findByText('A stand-down defect was reported.')).toBeInTheDocument();
  });

  it('explains the page to someone who is not an admin', async () => {
    setViewportWidth(DESKTOP_WIDTH);
    const p = testPerson('supervisor');
    mockApi({ 'GET /api/auth/me': p.me });
    renderApp('/admin/mail', p.session);
    expect(await screen.findByText('Not open to your role', {}, SLOW)).toBeInTheDocument();
  });
});
