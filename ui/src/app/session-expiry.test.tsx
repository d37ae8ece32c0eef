import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meQueryKey } from '../features/auth/api/get-me';
import { makeUser, meReply, mockApi, renderApp } from '../test-utils';

describe('expired session', () => {
  it('a 401 from an API call clears the session and goes to sign-in with the page to return to', async () => {
    const admin = makeUser('admin');
    let sessionAlive = true;
    mockApi({
      'GET /auth/me': () => meReply(sessionAlive ? admin : null),
      'GET /users': () =>
        sessionAlive
          ? { status: 200, body: { users: [admin] } }
          : { status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' } },
    });
    const { router, queryClient } = renderApp('/admin/users');
    expect(await screen.findByRole('heading', { name: 'Users' })).toBeInTheDocument();

    // The session ends on the server; the next call of the page gets a 401.
    sessionAlive = false;
    await queryClient.refetchQueries({ queryKey: ['users'] });

    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(router.state.location.search).toBe('?next=%2Fadmin%2Fusers');
    expect(queryClient.getQueryData(meQueryKey)).toBeNull();
    expect(queryClient.getQueryData(['users'])).toBeUndefined();
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
  });
});
