import { useEffect, useRef } from 'react';
import { Callout, Card, Spinner } from '@blueprintjs/core';
import { useSearchParams } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { isApiError } from '../../../lib/api-client';
import { useCurrentUser } from '../../../lib/current-user';
import { useVerifyEmail } from '../api/verify-email';
import '../account.css';

/** The link in the sign-up e-mail: confirms the address once, as soon as the page opens. */
export function VerifyEmailPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const verify = useVerifyEmail();
  const user = useCurrentUser();
  // The token works once: send it once, even when React runs the effect twice in development.
  const sent = useRef(false);
  const { mutate } = verify;

  useEffect(() => {
    if (!token || sent.current) return;
    sent.current = true;
    mutate(token);
  }, [token, mutate]);

  const next = user ? paths.home : paths.signIn;
  const nextText = user ? 'Go home' : 'Sign in';

  return (
    <Page narrow title="Confirm your e-mail address">
      <Card className="fw-form-card fw-account-card" aria-live="polite">
        {!token ? (
          <Callout intent="danger" title="This link has no token">
            Open the link from the e-mail again, or copy all of it into the address bar.
          </Callout>
        ) : verify.isSuccess ? (
          <Callout intent="success" title="Address confirmed">
            Thank you. Coaches and shops can now reach you by e-mail about your cases.
          </Callout>
        ) : verify.isError ? (
          <Callout intent="danger" title="The address could not be confirmed" role="alert">
            {isApiError(verify.error) && verify.error.status === 400
              ? 'This link has expired or was already used. If your address is not confirmed yet, sign up again or ask an admin.'
              : verify.error.message}
          </Callout>
        ) : (
          <div className="fw-account-busy">
            <Spinner size={24} aria-label="Confirming" /> Confirming your address…
          </div>
        )}
        {(verify.isSuccess || verify.isError || !token) && <LinkButton className="fw-touch" size="large" fill to={next} text={nextText} />}
      </Card>
    </Page>
  );
}
