import { Button, Callout, Card } from '@blueprintjs/core';
import { NotificationsIcon } from '@blueprintjs/icons';
import { Link, useSearchParams } from 'react-router-dom';
import { NOTICE_LABELS, type NoticeKind } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { isApiError } from '../../../lib/api-client';
import { useUnsubscribe } from '../api/unsubscribe';
import '../account.css';

const label = (kind: string) => NOTICE_LABELS[kind as NoticeKind] ?? kind;

/**
 * The "stop these e-mails" link of a notice. One press turns that kind of notice off, without
 * signing in (a mail scanner that opens the link presses nothing).
 */
export function UnsubscribePage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const unsubscribe = useUnsubscribe();

  return (
    <Page narrow title="Stop these e-mails">
      <Card className="fw-form-card fw-account-card">
        {unsubscribe.isSuccess ? (
          <Callout intent="success" title="Done">
            You will no longer get e-mails for: <strong>{label(unsubscribe.data)}</strong>. Turn them back on in your{' '}
            <Link to={paths.emailSettings}>e-mail settings</Link> (signed in).
          </Callout>
        ) : !token ? (
          <Callout intent="danger" title="This link has no token">
            Open the link from the e-mail again, or choose what to receive in your <Link to={paths.emailSettings}>e-mail settings</Link>.
          </Callout>
        ) : (
          <>
            <p>Stop the kind of e-mail this link came with? Account e-mails (address confirmation, password reset) are always sent.</p>
            {unsubscribe.isError && (
              <Callout className="fw-form-error" intent="danger" role="alert">
                {isApiError(unsubscribe.error) && unsubscribe.error.status === 400
                  ? 'This link is damaged or not from Fuelwright. Choose what to receive in your e-mail settings instead.'
                  : unsubscribe.error.message}
              </Callout>
            )}
            <Button
              className="fw-touch"
              size="large"
              intent="primary"
              fill
              icon={<NotificationsIcon />}
              text="Stop these e-mails"
              loading={unsubscribe.isPending}
              onClick={() => unsubscribe.mutate(token)}
            />
          </>
        )}
      </Card>
    </Page>
  );
}
