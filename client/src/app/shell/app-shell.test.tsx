import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Role } from '@/features/auth/api/types';
import { STORAGE_KEY } from '@/features/auth/token-store';
import { mockApi } from '@/test/api-mock';
import { sessionAnswer } from '@/test/fixtures';
import { renderApp } from '@/test/render-app';
import { DESKTOP_WIDTH, PHONE_WIDTH, setViewportWidth } from '@/test/viewport';

const meOf = (role: Role) => {
  const { user, activeClub, memberships } = sessionAnswer(role);
  return { status: 200, body: { user, activeClub, memberships } };
};

async function mainNav() {
  return within(await screen.findByRole('navigation', { name: 'Main' }));
}

describe('app shell', () => {
  it.each<[Role, boolean, boolean]>([
    ['crew', false, false],
    ['driver', false, false],
    ['supervisor', true, false],
    ['admin', true, true],
  ])('on a desktop, a %s sees Review desk: %s, Admin: %s', async (role, review, admin) => {
    setViewportWidth(DESKTOP_WIDTH);
    mockApi({ 'GET /api/auth/me': meOf(role) });
    renderApp('/', sessionAnswer(role));
    const nav = await mainNav();
    for (const label of ['Today', 'Checks', 'Trips', 'Defects', 'More']) {
      expect(nav.getByRole('link', { name: label })).toBeInTheDocument();
    }
    expect(nav.queryByRole('link', { name: 'Review desk' }) !== null).toBe(review);
    expect(nav.queryByRole('link', { name: 'Admin' }) !== null).toBe(admin);
  });

  it('on a phone, shows the five bottom items and keeps desktop screens out of the bar', async () => {
    setViewportWidth(PHONE_WIDTH);
    mockApi({ 'GET /api/auth/me': meOf('admin') });
    renderApp('/checks', sessionAnswer('admin'));
    const nav = await mainNav();
    expect(nav.getAllByRole('link').map((l) => l.textContent)).toEqual(['Today', 'Checks', 'Trips', 'Defects', 'More']);
    expect(nav.getByRole('link', { name: 'Checks' })).toHaveAttribute('aria-current', 'page');
  });

  it('shows the product, the active club and the person on a phone, from storage alone when offline', async () => {
    setViewportWidth(PHONE_WIDTH);
    mockApi({}); // every request fails as with no signal
    renderApp('/', sessionAnswer('driver'));
    const banner = await screen.findByRole('banner');
    expect(within(banner).getByText('Breakline')).toBeInTheDocument();
    expect(within(banner).getByText('Saltmarsh Heads Surf Club')).toBeInTheDocument();
    expect(within(banner).getByText('Ria Okafor')).toBeInTheDocument();
    expect(await screen.findByText('No boats yet')).toBeInTheDocument();
  });

  it('follows a role change from the server', async () => {
    setViewportWidth(DESKTOP_WIDTH);
    mockApi({ 'GET /api/auth/me': meOf('supervisor') });
    renderApp('/', sessionAnswer('crew'));
    const nav = await mainNav();
    expect(await nav.findByRole('link', { name: 'Review desk' })).toBeInTheDocument();
  });

  it('signs out from the account menu: tokens gone, server told, sign-in shown', async () => {
    setViewportWidth(PHONE_WIDTH);
    const { calls } = mockApi({ 'GET /api/auth/me': meOf('crew'), 'POST /api/auth/logout': { status: 204 } });
    renderApp('/', sessionAnswer('crew'));
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Account: Ria Okafor' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(localStorage.getItem(STORAGE_KEY)).toBeNull();
    await waitFor(() => expect(calls.find((c) => c.path === '/api/auth/logout')?.body).toEqual({ refreshToken: 'refresh-1' }));
  });

  it('explains a page the role does not open instead of showing it', async () => {
    setViewportWidth(DESKTOP_WIDTH);
    mockApi({ 'GET /api/auth/me': meOf('crew') });
    renderApp('/admin', sessionAnswer('crew'));
    expect(await screen.findByText('Not open to your role')).toBeInTheDocument();
  });

  it('switches the sunlight theme and remembers it', async () => {
    setViewportWidth(PHONE_WIDTH);
    mockApi({ 'GET /api/auth/me': meOf('crew') });
    const first = renderApp('/', sessionAnswer('crew'));
    const user = userEvent.setup();
    const toggle = await screen.findByRole('button', { name: 'Sunlight theme' });
    expect(toggle).toHaveAttribute('aria-pressed', 'false');
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-pressed', 'true');
    first.unmount();

    renderApp('/', sessionAnswer('crew'));
    expect(await screen.findByRole('button', { name: 'Sunlight theme' })).toHaveAttribute('aria-pressed', 'true');
  });
});
