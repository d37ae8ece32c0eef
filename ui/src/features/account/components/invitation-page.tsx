import { Button, Callout, Card, H2 } from '@blueprintjs/core';
import { EnvelopeIcon, LogInIcon, NewPersonIcon, TickIcon } from '@blueprintjs/icons';
import { generatePath, Link, useNavigate, useParams } from 'react-router-dom';
import { invitationPath, invitationSignUpPath, paths, signInPath } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { useNotify } from '../../../components/toaster';
import { isApiError } from '../../../lib/api-client';
import { useCurrentUser } from '../../../lib/current-user';
import { useAcceptInvitation } from '../api/accept-invitation';
import '../account.css';

const ROLE_NAMES: Record<string, string> = { racer: 'racer', coach: 'coach', shop: 'shop', admin: 'admin' };

/**
 * The link in an invitation e-mail. A visitor signs in (and comes back here) or creates an account
 * through the invitation (the account gets the role the racer chose and the share at once). A
 * signed-in user accepts, and goes to the shared case (or kart).
 */
export function InvitationPage() {
  const { token = '' } = useParams();
  const user = useCurrentUser();
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  const notify = useNotify();

  const lead = 'A racer shared a case or a kart with you, to review on Fuelwright: see every check, comment, ask for a photo and recommend the next check.';

  if (!user) {
    return (
      <Page narrow title="You are invited to review a case" lead={lead}>
        <Card className="fw-form-card fw-account-card">
          <H2 className="fw-account-title">Already have an account?</H2>
          <p className="fw-muted">Sign in, then accept the invitation on the next screen.</p>
          <LinkButton className="fw-touch" size="large" intent="primary" fill icon={<LogInIcon />} to={signInPath(invitationPath(token))} text="Sign in" />
        </Card>
        <Card className="fw-form-card fw-account-card">
          <H2 className="fw-account-title">New to Fuelwright?</H2>
          <p className="fw-muted">
            Create your account with the address the invitation was sent to. It becomes a coach or shop account, as the racer chose,
            with the shared case ready.
          </p>
          <LinkButton className="fw-touch" size="large" fill icon={<NewPersonIcon />} to={invitationSignUpPath(token)} text="Create an account" />
        </Card>
      </Page>
    );
  }

  const canReview = user.role === 'coach' || user.role === 'shop';
  const tokenError = isApiError(accept.error) ? (accept.error.fieldErrors('token')[0] ?? accept.error.message) : accept.error?.message;

  const onAccept = () =>
    accept.mutate(token, {
      onSuccess: (result) => {
        if (result.caseId) {
          notify.success('Invitation accepted. Here is the case.');
          navigate(generatePath(paths.case, { caseId: result.caseId }), { replace: true });
        } else {
          notify.success(`Invitation accepted. Every case on ${result.share.kartName} is shared with you.`);
          navigate(generatePath(paths.kart, { kartId: result.kartId }), { replace: true });
        }
      },
    });

  return (
    <Page narrow title="You are invited to review a case" lead={lead}>
      <Card className="fw-form-card fw-account-card">
        <p>
          Signed in as <strong className="fw-break">{user.displayName}</strong> <span className="fw-muted fw-break">({user.email})</span>.
        </p>
        {!canReview && (
          <Callout intent="warning" className="fw-form-note" title="This account cannot review cases">
            Shared cases open for coach and shop accounts; this is a {ROLE_NAMES[user.role] ?? user.role} account. If the invitation
            went to another address, sign out and sign in with that one (or create an account with it).
          </Callout>
        )}
        {tokenError && (
          <Callout intent="danger" className="fw-form-error" role="alert" title="The invitation could not be accepted">
            {tokenError.charAt(0).toUpperCase() + tokenError.slice(1)}. Ask the racer to share it again.
          </Callout>
        )}
        {accept.isError ? (
          <LinkButton className="fw-touch" size="large" fill to={canReview ? paths.sharedCases : paths.home} text={canReview ? 'Go to shared cases' : 'Go home'} />
        ) : (
          <Button className="fw-touch" size="large" intent="primary" fill icon={<TickIcon />} text="Accept the invitation" loading={accept.isPending} onClick={onAccept} />
        )}
        <p className="fw-form-links fw-small fw-muted">
          <EnvelopeIcon size={12} /> The link works once. To stop e-mails about shared cases, see your{' '}
          <Link to={paths.emailSettings}>e-mail settings</Link>.
        </p>
      </Card>
    </Page>
  );
}
