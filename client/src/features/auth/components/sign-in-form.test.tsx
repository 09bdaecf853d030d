import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { renderApp } from '@/test/render-app';
import { STORAGE_KEY, tokenStore } from '../token-store';

const emailBox = () => screen.getByLabelText('E-mail');
const passwordBox = () => screen.getByLabelText('Password');
const signInButton = () => screen.getByRole('button', { name: 'Sign in' });

/** The sign-in screen loads on demand: wait for it once, then read it directly. */
const shown = () => screen.findByRole('button', { name: 'Sign in' });

async function fillAndSubmit(email: string, password: string) {
  await shown();
  const user = userEvent.setup();
  if (email) await user.type(emailBox(), email);
  if (password) await user.type(passwordBox(), password);
  await user.click(signInButton());
  return user;
}

describe('sign-in form', () => {
  it.each([
    ['', 'secret-pass', 'Enter your e-mail address.'],
    ['ria.okafor', 'secret-pass', 'Enter an e-mail address like name@example.org.'],
    ['ria.okafor@example.org', '', 'Enter your password.'],
  ])('with e-mail "%s" and password "%s" says "%s" and sends nothing', async (email, password, message) => {
    const { calls } = mockApi({});
    renderApp('/sign-in');
    await fillAndSubmit(email, password);
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it('shows a message for each empty field at once', async () => {
    mockApi({});
    renderApp('/sign-in');
    await fillAndSubmit('', '');
    expect(screen.getByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(emailBox()).toHaveAttribute('aria-invalid', 'true');
  });

  it('labels only the password box "password" (the show/hide button is worded apart)', async () => {
    mockApi({});
    renderApp('/sign-in');
    await shown();
    expect(screen.getAllByLabelText(/password/i)).toEqual([passwordBox()]);
    expect(screen.getAllByLabelText(/e-mail/i)).toEqual([emailBox()]);
  });

  it("shows the server's message on a 401 and keeps what was typed", async () => {
    const { calls } = mockApi({
      'POST /api/auth/login': {
        status: 401,
        body: { statusCode: 401, code: 'invalid_credentials', message: 'E-mail or password is not right.' },
      },
    });
    renderApp('/sign-in');
    await fillAndSubmit('ria.okafor@example.org', 'wrong-pass');
    expect(await screen.findByText('E-mail or password is not right.')).toBeInTheDocument();
    expect(emailBox()).toHaveValue('ria.okafor@example.org');
    expect(passwordBox()).toHaveValue('wrong-pass');
    expect(calls[0].body).toEqual({ email: 'ria.okafor@example.org', password: 'wrong-pass' });
    expect(tokenStore.getState().session).toBeNull();
  });

  it("puts the server's field messages of a validation_failed beside the fields", async () => {
    mockApi({
      'POST /api/auth/login': {
        status: 400,
        body: {
          statusCode: 400,
          code: 'validation_failed',
          message: 'Some fields need fixing.',
          details: [{ field: 'password', message: 'Password must be at most 200 characters.' }],
        },
      },
    });
    renderApp('/sign-in');
    await fillAndSubmit('ria.okafor@example.org', 'x');
    expect(await screen.findByText('Password must be at most 200 characters.')).toBeInTheDocument();
    expect(passwordBox()).toHaveAttribute('aria-invalid', 'true');
  });

  it('says plainly when there is no connection', async () => {
    mockApi({});
    renderApp('/sign-in');
    await fillAndSubmit('ria.okafor@example.org', 'secret-pass');
    expect(await screen.findByText(/No connection to the Breakline server/)).toBeInTheDocument();
  });

  it('is busy while the server answers, then stores the tokens and opens Today', async () => {
    let answer: (value: { status: number; body: unknown }) => void = () => {};
    mockApi({ 'POST /api/auth/login': () => new Promise((resolve) => (answer = resolve)) });
    renderApp('/sign-in');
    await fillAndSubmit('ria.okafor@example.org', 'secret-pass');

    const busy = await screen.findByRole('button', { name: 'Signing in…' });
    expect(busy).toBeDisabled();

    answer({ status: 200, body: sessionAnswer('driver', { accessToken: 'a-9', refreshToken: 'r-9' }) });
    expect(await screen.findByRole('heading', { name: 'Today' })).toBeInTheDocument();
    expect(await screen.findByText('No boats yet')).toBeInTheDocument();
    const stored = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? 'null');
    expect(stored).toMatchObject({ accessToken: 'a-9', refreshToken: 'r-9', activeClub: { role: 'driver' } });
  });

  it('returns to the page that asked for sign-in', async () => {
    mockApi({ 'POST /api/auth/login': { status: 200, body: sessionAnswer() }, 'GET /api/auth/me': { status: 200, body: sessionAnswer() } });
    const { router } = renderApp('/defects');
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    await fillAndSubmit('ria.okafor@example.org', 'secret-pass');
    expect(await screen.findByRole('heading', { name: 'Defects' })).toBeInTheDocument();
  });
});
