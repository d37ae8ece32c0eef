import { Button, Callout, Card, NonIdealState, Switch } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import { NOTICE_KINDS, NOTICE_LABELS, type NoticeKind } from '@fuelwright/shared';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { useRequiredUser } from '../../../lib/current-user';
import { useNoticeSettings } from '../api/get-notice-settings';
import { useSaveNoticeSettings } from '../api/save-notice-settings';
import '../account.css';

/** Which notices to get by e-mail, one switch per kind; each change is saved at once. */
export function EmailSettingsPage() {
  const user = useRequiredUser();
  const settings = useNoticeSettings();
  const save = useSaveNoticeSettings();
  const notify = useNotify();

  if (settings.isPending) return <PageSpinner label="Loading your e-mail settings" />;
  if (settings.isError) {
    return (
      <Page narrow title="E-mail settings">
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="The settings could not be loaded"
          description={settings.error.message}
          action={<Button size="large" text="Try again" onClick={() => void settings.refetch()} />}
        />
      </Page>
    );
  }

  const toggle = (kind: NoticeKind, on: boolean) =>
    save.mutate({ [kind]: on }, { onError: (error) => notify.error(`Not saved: ${error.message}`) });

  return (
    <Page narrow title="E-mail settings" lead={<>Notices go to <strong className="fw-break">{user.email}</strong>.</>}>
      {!user.emailVerified && (
        <Callout intent="warning" title="Address not confirmed yet">
          Open the link in the e-mail we sent when you signed up, so coaches and shops can reach you.
        </Callout>
      )}
      <Card className="fw-form-card fw-account-card">
        <fieldset className="fw-account-switches">
          <legend>E-mail me about</legend>
          {NOTICE_KINDS.map((kind) => (
            <Switch
              key={kind}
              className="fw-account-switch"
              size="large"
              label={NOTICE_LABELS[kind]}
              checked={settings.data[kind] !== false}
              onChange={(event) => toggle(kind, event.currentTarget.checked)}
            />
          ))}
        </fieldset>
        <p className="fw-small fw-muted fw-account-note">
          Changes are saved at once. Account e-mails (address confirmation, password reset) are always sent. Each notice also has a link to
          stop that kind.
        </p>
      </Card>
    </Page>
  );
}
