import { useState, type FormEvent } from 'react';
import { Button, Callout, Card } from '@blueprintjs/core';
import { NewPersonIcon } from '@blueprintjs/icons';
import { Link, useSearchParams } from 'react-router-dom';
import { DISPLAY_NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@fuelwright/shared';
import { INVITATION_PARAM, invitationPath, signInPath } from '../../../app/paths';
import { Page } from '../../../components/page';
import { PasswordField } from '../../../components/password-field';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { useSignUp } from '../api/sign-up';
import { useNextPath } from '../hooks/use-next-path';

const FIELDS = ['displayName', 'email', 'password'] as const;

/** Sign-up: every new account is a racer account; an admin can change the role later. */
export function SignUpPage() {
  const [displayName, setDisplayName] = useState('');
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const signUp = useSignUp();
  const next = useNextPath();
  // Signing up through an invitation link: a racer account, like every new one, with the share (which lets it review).
  const invitationToken = useSearchParams()[0].get(INVITATION_PARAM) || undefined;
  const errors = formErrors(signUp.error, FIELDS);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    signUp.mutate({ displayName: displayName.trim(), email: email.trim(), password, ...(invitationToken ? { invitationToken } : {}) });
  };

  return (
    <Page narrow title="Create account" lead="Keep your karts, setups and cases in one place.">
      <Card className="fw-form-card">
        {invitationToken && (
          <Callout className="fw-form-note" intent="primary" compact>
            You were invited to review a case. Use the address the invitation was sent to: the shared case is ready in your new
            account, under Shared cases.
          </Callout>
        )}
        <form onSubmit={submit} noValidate aria-label="Create account">
          <TextField
            id="sign-up-name"
            label="Your name"
            autoComplete="name"
            maxLength={DISPLAY_NAME_MAX_LENGTH}
            value={displayName}
            onChange={setDisplayName}
            errors={errors.field('displayName')}
            hint="Shown to the coaches and shops you share a case with."
          />
          <TextField
            id="sign-up-email"
            label="E-mail"
            type="email"
            inputMode="email"
            autoComplete="email"
            autoCapitalize="none"
            spellCheck={false}
            value={email}
            onChange={setEmail}
            errors={errors.field('email')}
          />
          <PasswordField
            id="sign-up-password"
            label="Password"
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
            </Callout>
          )}
          <Button
            className="fw-touch"
            type="submit"
            intent="primary"
            size="large"
            fill
            icon={<NewPersonIcon />}
            text="Create account"
            loading={signUp.isPending}
          />
        </form>
        {invitationToken ? (
          <p className="fw-form-links">
            Already have an account? <Link to={signInPath(invitationPath(invitationToken))}>Sign in and accept</Link>
          </p>
        ) : (
          <p className="fw-form-links">
            New accounts are racer accounts. Coaches and shops: an admin sets your role after you sign up.
            <br />
            Already have an account? <Link to={signInPath(next)}>Sign in</Link>
          </p>
        )}
      </Card>
    </Page>
  );
}
