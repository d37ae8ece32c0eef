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

/**
 * The link in an invitation e-mail. A visitor signs in (and comes back here) or creates an account
 * through the invitation (a racer account, like every new one, with the share at once: the share,
 * not a role, lets it review). A signed-in user of any role accepts, and goes to the shared case
 * (or kart).
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
            Create your account with the address the invitation was sent to. The shared case is ready in it, under Shared cases.
          </p>
          <LinkButton className="fw-touch" size="large" fill icon={<NewPersonIcon />} to={invitationSignUpPath(token)} text="Create an account" />
        </Card>
      </Page>
    );
  }

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
        {tokenError && (
          <Callout intent="danger" className="fw-form-error" role="alert" title="The invitation could not be accepted">
            {tokenError.charAt(0).toUpperCase() + tokenError.slice(1)}. Ask the racer to share it again.
          </Callout>
        )}
        {accept.isError ? (
          <LinkButton className="fw-touch" size="large" fill to={paths.sharedCases} text="Go to shared cases" />
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
