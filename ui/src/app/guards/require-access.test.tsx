import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../test-utils';

describe('route guards', () => {
  it('sends a visitor from a signed-in page to sign-in, remembering the page', async () => {
    mockApi({ 'GET /auth/me': meReply(null) });
    const { router } = renderApp('/home');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fhome');
  });

  it('shows "not for your role" on a page of another role, without calling its API', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(makeUser('racer')) });
    const { router } = renderApp('/admin/users');
    expect(await screen.findByRole('heading', { name: 'Not for your role' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/users');
    expect(calls.map((c) => c.path)).not.toContain('/users');
  });

  it('sends a signed-in user away from sign-in to their home', async () => {
    mockApi({ 'GET /auth/me': meReply(makeUser('shop', { displayName: 'Sam Shop' })) });
    const { router } = renderApp('/sign-in');
    expect(await screen.findByRole('heading', { name: 'Hello, Sam Shop' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/home');
    expect(screen.getByRole('heading', { name: 'Work orders' })).toBeInTheDocument();
  });

  it('lets a visitor open a page open to anyone (the quick diagnosis)', async () => {
    mockApi({ 'GET /auth/me': meReply(null) });
    const { router } = renderApp('/diagnose');
    expect(await screen.findByRole('heading', { level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/diagnose');
    expect(screen.queryByRole('form', { name: 'Sign in' })).toBeNull();
    expect(screen.queryByRole('heading', { name: 'Not for your role' })).toBeNull();
  });

  it('shows a not-found page for an unknown path', async () => {
    mockApi({ 'GET /auth/me': meReply(null) });
    renderApp('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });

  it('signing out from a role page lands on the start page, not on sign-in', async () => {
    setPhoneWidth(false);
    let signedIn = true;
    const calls = mockApi({
      'GET /auth/me': () => meReply(signedIn ? makeUser('admin') : null),
      'GET /users': { status: 200, body: { users: [makeUser('admin')] } },
      'POST /auth/sign-out': () => {
        signedIn = false;
        return { status: 204 };
      },
    });
    const { router } = renderApp('/admin/users');
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { name: 'Find the fuel fault, fix it safely' })).toBeInTheDocument();
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
    expect(calls.some((c) => c.method === 'POST' && c.path === '/auth/sign-out')).toBe(true);
    expect(screen.queryByRole('button', { name: 'Sign out' })).toBeNull();
  });
});
