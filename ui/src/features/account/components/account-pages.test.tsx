import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';

const TOKEN = 'inv-token-0123456789';

describe('invitation link', { timeout: 20_000 }, () => {
  it('offers a visitor sign-in (back to the link) or sign-up through the invitation', async () => {
    mockApi({ 'GET /auth/me': meReply(null) });
    renderApp(`/invitations/${TOKEN}`);
    const signIn = await screen.findByRole('button', { name: 'Sign in' });
    expect(signIn).toHaveAttribute('href', `/sign-in?next=${encodeURIComponent(`/invitations/${TOKEN}`)}`);
    expect(screen.getByRole('button', { name: 'Create an account' })).toHaveAttribute('href', `/sign-up?invitation=${TOKEN}&next=%2Fshared-cases`);
  });

  it('signs up through the invitation: the token goes along, and a wrong address is named under the field', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(null),
      'POST /auth/sign-up': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Invalid', fields: { email: ['use the address the invitation was sent to (c@example.test)'] } },
      },
    });
    renderApp(`/sign-up?invitation=${TOKEN}&next=%2Fshared-cases`);
    const user = userEvent.setup();
    expect(await screen.findByText(/You were invited to review a case/)).toBeInTheDocument();
    await user.type(screen.getByLabelText('Your name'), 'Cole Coach');
    await user.type(screen.getByLabelText('E-mail'), 'other@example.test');
    await user.type(screen.getByLabelText('Password'), 'a long password here');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('use the address the invitation was sent to (c@example.test)')).toBeInTheDocument();
    const body = JSON.parse(String(calls.find((c) => c.path === '/auth/sign-up')!.init.body));
    expect(body).toEqual({ displayName: 'Cole Coach', email: 'other@example.test', password: 'a long password here', invitationToken: TOKEN });
  });

  it('after signing up through the invitation, opens the shared case (a racer account, like every new one)', async () => {
    mockApi({
      'GET /auth/me': meReply(null),
      'POST /auth/sign-up': { status: 201, body: { user: makeUser('racer', { email: 'c@example.test' }), shared: { caseId: 'c1', kartId: 'k1' } } },
    });
    const { router } = renderApp(`/sign-up?invitation=${TOKEN}&next=%2Fshared-cases`);
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Your name'), 'Cole Coach');
    await user.type(screen.getByLabelText('E-mail'), 'c@example.test');
    await user.type(screen.getByLabelText('Password'), 'a long password here');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/cases/c1'));
  });

  it('accepts for a signed-in coach and opens the shared case', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('coach')),
      'POST /invitations/accept': { status: 200, body: { share: { kartName: 'Blue 27' }, caseId: 'c1', kartId: 'k1' } },
    });
    const { router } = renderApp(`/invitations/${TOKEN}`);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Accept the invitation' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/cases/c1'));
    expect(calls.find((c) => c.path === '/invitations/accept')!.init.body).toBe(JSON.stringify({ token: TOKEN }));
  });

  it('says why a used or expired link cannot be accepted', async () => {
    mockApi({
      'GET /auth/me': meReply(makeUser('coach')),
      'POST /invitations/accept': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Invalid', fields: { token: ['this invitation link has expired, was already used, or was withdrawn'] } },
      },
    });
    renderApp(`/invitations/${TOKEN}`);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Accept the invitation' }));
    expect(await screen.findByText(/This invitation link has expired, was already used, or was withdrawn/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Go to shared cases' })).toBeInTheDocument();
  });
});

describe('account e-mail links', { timeout: 20_000 }, () => {
  it('links sign-in to the password reset, which answers the same for any address', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(null), 'POST /auth/request-password-reset': { status: 202, body: { message: 'ok' } } });
    renderApp('/sign-in');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(await screen.findByRole('heading', { name: 'Forgot your password?' })).toBeInTheDocument();
    await user.type(screen.getByLabelText('E-mail'), 'someone@example.test');
    await user.click(screen.getByRole('button', { name: 'E-mail me a link' }));
    expect(await screen.findByText(/If an account uses someone@example.test/)).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/auth/request-password-reset')!.init.body).toBe(JSON.stringify({ email: 'someone@example.test' }));
  });

  it('sets a new password with the token from the link', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(null), 'POST /auth/reset-password': { status: 204 } });
    renderApp('/reset-password?token=reset-tok');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('New password'), 'a brand new password');
    await user.click(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByText('Password changed')).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/auth/reset-password')!.init.body).toBe(JSON.stringify({ token: 'reset-tok', password: 'a brand new password' }));
  });

  it('confirms the address once when the page opens', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(null), 'POST /auth/verify-email': { status: 204 } });
    renderApp('/verify-email?token=verify-tok');
    expect(await screen.findByText('Address confirmed')).toBeInTheDocument();
    expect(calls.filter((c) => c.path === '/auth/verify-email').map((c) => c.init.body)).toEqual([JSON.stringify({ token: 'verify-tok' })]);
  });

  it('stops one kind of notice from its link, only when asked', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(null), 'POST /notifications/unsubscribe': { status: 200, body: { kind: 'comment' } } });
    renderApp('/unsubscribe?token=unsub-tok');
    const button = await screen.findByRole('button', { name: 'Stop these e-mails' });
    expect(calls.some((c) => c.path === '/notifications/unsubscribe')).toBe(false);
    await userEvent.setup().click(button);
    expect(await screen.findByText('New comments on a case')).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/notifications/unsubscribe')!.init.body).toBe(JSON.stringify({ token: 'unsub-tok' }));
  });

  it('shows each kind of notice as a switch and saves a change at once', async () => {
    let notices: Record<string, boolean> = { comment: false };
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('racer')),
      'GET /me/notifications': () => ({ status: 200, body: { notices } }),
      'PUT /me/notifications': (init) => {
        notices = { ...notices, ...JSON.parse(String(init.body)) };
        return { status: 200, body: { notices } };
      },
    });
    renderApp('/account/e-mails');
    const comments = await screen.findByRole('checkbox', { name: 'New comments on a case' });
    expect(comments).not.toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'A check recommended on your case' })).toBeChecked();
    await userEvent.setup().click(comments);
    await waitFor(() => expect(screen.getByRole('checkbox', { name: 'New comments on a case' })).toBeChecked());
    expect(calls.find((c) => c.method === 'PUT')!.init.body).toBe(JSON.stringify({ comment: true }));
    // One switch per kind, progress on a shared case among them.
    expect(screen.getAllByRole('checkbox')).toHaveLength(7);
    await userEvent.setup().click(screen.getByRole('checkbox', { name: 'Progress on a shared case' }));
    await waitFor(() => expect(screen.getByRole('checkbox', { name: 'Progress on a shared case' })).not.toBeChecked());
    expect(calls.filter((c) => c.method === 'PUT').at(-1)!.init.body).toBe(JSON.stringify({ 'case-progress': false }));
  });
});
