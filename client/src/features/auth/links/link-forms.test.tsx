import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { renderApp } from '@/test/render-app';
import { tokenStore } from '../token-store';
import { tokenFromHash } from './api';
import { newPasswordProblems } from './validate';

// Typing whole passwords with user-event is slow on a busy machine; these wait longer than the default.
describe('links from e-mails', { timeout: 30_000 }, () => {
  it('reads the token after #token= and nothing else', () => {
    expect(tokenFromHash('#token=abc.def')).toBe('abc.def');
    expect(tokenFromHash('token=xyz')).toBe('xyz');
    expect(tokenFromHash('')).toBeNull();
    expect(tokenFromHash('#token=')).toBeNull();
  });

  it('asks for 10 characters and the same password twice', () => {
    expect(newPasswordProblems({ password: 'short', repeat: 'short' }).password).toMatch(/at least 10/);
    expect(newPasswordProblems({ password: 'long enough pass', repeat: 'long enough pas' }).repeat).toMatch(/differ/);
    expect(newPasswordProblems({ password: 'long enough pass', repeat: 'long enough pass' })).toEqual({});
  });

  it('joins a club from an invitation with a new account and keeps the session', async () => {
    const { calls } = mockApi({ 'POST /api/invites/accept': { status: 201, body: sessionAnswer() } });
    renderApp('/accept-invite#token=tok-123');
    expect(tokenStore.getState().session).toBeNull();
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Your name'), 'Tama Ruaine');
    await user.type(screen.getByLabelText('Choose a password'), 'kelp and tide 42');
    await user.type(screen.getByLabelText('Type the password again'), 'kelp and tide 42');
    await user.click(screen.getByRole('button', { name: 'Join the club' }));
    await waitFor(() => expect(tokenStore.getState().session).not.toBeNull());
    const sent = calls.find((c) => c.path === '/api/invites/accept');
    expect(sent?.body).toEqual({ token: 'tok-123', displayName: 'Tama Ruaine', password: 'kelp and tide 42' });
  });

  it("shows the server's reason for a used link and keeps what was typed", async () => {
    mockApi({
      'POST /api/invites/accept': { status: 410, body: { statusCode: 410, code: 'link_used', message: 'This invitation has already been used. Sign in instead.' } },
    });
    renderApp('/accept-invite#token=tok-used');
    const user = userEvent.setup();
    await user.click(await screen.findByLabelText(/already have a Breakline account/));
    await user.type(screen.getByLabelText('Your password'), 'old password 1');
    await user.click(screen.getByRole('button', { name: 'Join the club' }));
    expect(await screen.findByText('This invitation has already been used. Sign in instead.')).toBeInTheDocument();
    expect(screen.getByLabelText('Your password')).toHaveValue('old password 1');
  });

  it('says what to do when the link lost its token', async () => {
    mockApi({});
    renderApp('/reset-password');
    expect(await screen.findByText(/missing the part of the link/)).toBeInTheDocument();
  });

  it('asks for a reset link and answers the same whoever the address belongs to', async () => {
    const { calls } = mockApi({ 'POST /api/auth/password-reset': { status: 202, body: { message: 'sent' } } });
    renderApp('/forgot-password');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('E-mail'), 'nobody@gannetbay.example');
    await user.click(screen.getByRole('button', { name: 'E-mail me a link' }));
    expect(await screen.findByText(/a link to choose a new password is on its way/)).toBeInTheDocument();
    expect(calls[0]?.body).toEqual({ email: 'nobody@gannetbay.example' });
  });
});
