import { useState, type FormEvent } from 'react';
import { Button, Callout, Card } from '@blueprintjs/core';
import { EnvelopeIcon, KeyIcon } from '@blueprintjs/icons';
import { Link, useSearchParams } from 'react-router-dom';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PasswordField } from '../../../components/password-field';
import { TextField } from '../../../components/text-field';
import { isApiError } from '../../../lib/api-client';
import { formErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { useResetPassword } from '../api/reset-password';
import '../account.css';

/** Step 1: the address. The answer is the same whether or not it has an account. */
function RequestResetForm() {
  const [email, setEmail] = useState('');
  const request = useRequestPasswordReset();
  const errors = formErrors(request.error, ['email']);

  if (request.isSuccess) {
    return (
      <Card className="fw-form-card fw-account-card">
        <Callout intent="success" icon={<EnvelopeIcon size={20} />} title="Check your e-mail">
          If an account uses {request.variables}, a link to choose a new password is on its way. It works once, for one hour.
        </Callout>
        <p className="fw-form-links">Nothing after a few minutes? Look in the spam folder, or try another address.</p>
        <div className="fw-account-actions">
          <Button className="fw-touch" size="large" variant="outlined" text="Try another address" onClick={() => request.reset()} />
          <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.signIn} text="Back to sign in" />
        </div>
      </Card>
    );
  }

  return (
    <Card className="fw-form-card fw-account-card">
      <form
        noValidate
        aria-label="Reset password"
        onSubmit={(event: FormEvent<HTMLFormElement>) => {
          event.preventDefault();
          request.mutate(email.trim());
        }}
      >
        <TextField
          id="reset-email"
          label="E-mail"
          type="email"
          inputMode="email"
          autoComplete="username"
          autoCapitalize="none"
          spellCheck={false}
          value={email}
          onChange={setEmail}
          errors={errors.field('email')}
        />
        {errors.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {errors.form}
          </Callout>
        )}
        <Button className="fw-touch" type="submit" intent="primary" size="large" fill icon={<EnvelopeIcon />} text="E-mail me a link" loading={request.isPending} />
      </form>
      <p className="fw-form-links">
        Remembered it? <Link to={paths.signIn}>Sign in</Link>
      </p>
    </Card>
  );
}

/** Step 2: from the e-mailed link, the new password. Every session of the account ends. */
function NewPasswordForm({ token }: { token: string }) {
  const [password, setPassword] = useState('');
  const reset = useResetPassword();
  const errors = formErrors(reset.error, ['password']);
  const linkDead = isApiError(reset.error) && reset.error.fieldErrors('token').length > 0;

  if (reset.isSuccess) {
    return (
      <Card className="fw-form-card fw-account-card">
        <Callout intent="success" title="Password changed">
          You were signed out everywhere. Sign in with the new password.
        </Callout>
        <LinkButton className="fw-touch" size="large" intent="primary" fill to={paths.signIn} text="Sign in" />
      </Card>
    );
  }

  return (
    <Card className="fw-form-card fw-account-card">
      <form
        noValidate
        aria-label="Choose a new password"
        onSubmit={(event: FormEvent<HTMLFormElement>) => {
          event.preventDefault();
          reset.mutate({ token, password });
        }}
      >
        <PasswordField
          id="reset-password"
          label="New password"
          autoComplete="new-password"
          maxLength={PASSWORD_MAX_LENGTH}
          value={password}
          onChange={setPassword}
          errors={errors.field('password')}
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        />
        {errors.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {errors.form}
            {linkDead && (
              <>
                {' '}
                <Link to={paths.resetPassword}>Ask for a new link</Link>.
              </>
            )}
          </Callout>
        )}
        <Button className="fw-touch" type="submit" intent="primary" size="large" fill icon={<KeyIcon />} text="Set the new password" loading={reset.isPending} />
      </form>
    </Card>
  );
}

/** `/reset-password`: asks for the address; with `?token=` from the e-mail, for the new password. */
export function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token');
  return (
    <Page
      narrow
      title={token ? 'Choose a new password' : 'Forgot your password?'}
      lead={token ? undefined : 'Give the address you sign in with, and we e-mail you a link to choose a new password.'}
    >
      {token ? <NewPasswordForm token={token} /> : <RequestResetForm />}
    </Page>
  );
}
