import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { SIGN_IN_FAILED_MESSAGE } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(submitButton());
}

/** The form's own button (the navbar has a "Sign in" link too). */
function submitButton() {
  return within(screen.getByRole('form', { name: 'Sign in' })).getByRole('button', { name: 'Sign in' });
}

describe('sign-in form', () => {
  it('shows the 400 field errors under their fields and keeps what was typed', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(null),
      'POST /auth/sign-in': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields are not valid.',
          fields: { email: ['Enter a valid e-mail address.'] },
        },
      },
    });
    renderApp('/sign-in');
    await fillAndSubmit('racer-at-example', 'long enough password');

    const email = screen.getByLabelText('E-mail');
    expect(await screen.findByText('Enter a valid e-mail address.')).toBeInTheDocument();
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address.');
    expect(email).toHaveValue('racer-at-example');
    expect(screen.getByLabelText('Password')).toHaveValue('long enough password');
    expect(screen.getByLabelText('Password')).not.toHaveAttribute('aria-invalid');
    expect(calls.find((c) => c.path === '/auth/sign-in')?.init.body).toBe(
      JSON.stringify({ email: 'racer-at-example', password: 'long enough password' }),
    );
  });

  it('shows the server message on a 401 and on a 429, keeping both values', async () => {
    let attempt = 0;
    mockApi({
      'GET /auth/me': meReply(null),
      'POST /auth/sign-in': () =>
        ++attempt === 1
          ? { status: 401, body: { statusCode: 401, error: 'Unauthorized', message: SIGN_IN_FAILED_MESSAGE } }
          : { status: 429, body: { statusCode: 429, error: 'Too Many Requests', message: 'Too many sign-in attempts.' } },
    });
    renderApp('/sign-in');
    await fillAndSubmit('racer@example.test', 'wrong password');
    expect(await screen.findByRole('alert')).toHaveTextContent(SIGN_IN_FAILED_MESSAGE);
    expect(screen.getByLabelText('E-mail')).toHaveValue('racer@example.test');
    expect(screen.getByLabelText('Password')).toHaveValue('wrong password');

    await userEvent.setup().click(submitButton());
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent('Too many sign-in attempts.'));
    expect(screen.getByLabelText('Password')).toHaveValue('wrong password');
  });

  it('goes on to the page in ?next= after signing in', async () => {
    const racer = makeUser('racer');
    mockApi({ 'GET /auth/me': meReply(null), 'POST /auth/sign-in': { status: 200, body: { user: racer } } });
    const { router } = renderApp('/sign-in?next=%2Fkarts');
    await fillAndSubmit(racer.email, 'a good password');
    await waitFor(() => expect(router.state.location.pathname).toBe('/karts'));
    expect(screen.queryByRole('form', { name: 'Sign in' })).toBeNull();
  });
});
