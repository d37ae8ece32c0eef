import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { meReply, mockApi, renderApp } from '../../../test-utils';

describe('sign-up form', () => {
  it('puts each field error under its field and loses nothing typed', async () => {
    mockApi({
      'GET /auth/me': meReply(null),
      'POST /auth/sign-up': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields are not valid.',
          fields: { displayName: ['Enter your name.'], password: ['Use at least 10 characters.'] },
        },
      },
    });
    renderApp('/sign-up');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Your name'), ' ');
    await user.type(screen.getByLabelText('E-mail'), 'new.racer@example.test');
    await user.type(screen.getByLabelText('Password', { selector: 'input' }), 'short');
    const form = screen.getByRole('form', { name: 'Create account' });
    await user.click(within(form).getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Enter your name.')).toBeInTheDocument();
    expect(screen.getByLabelText('Your name')).toHaveAccessibleDescription('Enter your name.');
    expect(screen.getByLabelText('Password', { selector: 'input' })).toHaveAccessibleDescription('Use at least 10 characters.');
    expect(screen.getByLabelText('E-mail')).not.toHaveAttribute('aria-invalid');
    expect(screen.getByLabelText('E-mail')).toHaveValue('new.racer@example.test');
    expect(screen.getByLabelText('Password', { selector: 'input' })).toHaveValue('short');
    // Field errors are shown where they belong, not repeated in a form-level message.
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
