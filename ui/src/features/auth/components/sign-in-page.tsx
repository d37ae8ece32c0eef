import { useState, type FormEvent } from 'react';
import { Button, Callout, Card } from '@blueprintjs/core';
import { LogInIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';
import { paths, signUpPath } from '../../../app/paths';
import { Page } from '../../../components/page';
import { PasswordField } from '../../../components/password-field';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';
import { useNextPath } from '../hooks/use-next-path';

const FIELDS = ['email', 'password'] as const;

/**
 * Sign-in. On success the session is stored and the route guard moves on to `?next=` or home.
 * On an error the typed values stay; field errors show under their fields, anything else (wrong
 * e-mail or password, too many attempts, no connection) in one message above the button.
 */
export function SignInPage() {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const signIn = useSignIn();
  const next = useNextPath();
  const errors = formErrors(signIn.error, FIELDS);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    signIn.mutate({ email: email.trim(), password });
  };

  return (
    <Page narrow title="Sign in" lead="Your karts, cases and setups are waiting.">
      <Card className="fw-form-card">
        {next && (
          <Callout className="fw-form-note" intent="primary" compact>
            Sign in to continue to the page you opened.
          </Callout>
        )}
        <form onSubmit={submit} noValidate aria-label="Sign in">
          <TextField
            id="sign-in-email"
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
          <PasswordField
            id="sign-in-password"
            label="Password"
            autoComplete="current-password"
            value={password}
            onChange={setPassword}
            errors={errors.field('password')}
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
            icon={<LogInIcon />}
            text="Sign in"
            loading={signIn.isPending}
          />
        </form>
        <p className="fw-form-links">
          <Link to={paths.resetPassword}>Forgot your password?</Link>
          <br />
          New here? <Link to={signUpPath(next)}>Create an account</Link>
          <br />
          No account needed for a <Link to={paths.quickDiagnosis}>quick diagnosis</Link>.
        </p>
      </Card>
    </Page>
  );
}
