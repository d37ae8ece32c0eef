import { useState } from 'react';
import { Button, Callout, Card, Collapse, NonIdealState, SegmentedControl, Tag, type Intent } from '@blueprintjs/core';
import { ChevronDownIcon, ChevronRightIcon, EnvelopeIcon, ErrorIcon, RefreshIcon, SendMessageIcon } from '@blueprintjs/icons';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { ApiError } from '../../../lib/api-client';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { useFlushOutbox } from '../api/flush-outbox';
import { useOutbox } from '../api/get-outbox';
import { useRetryOutboxMessage } from '../api/retry-outbox-message';
import '../outbox.css';

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'medium' });
const when = (iso: string) => {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
};

const STATUS: Record<OutboxMessageDto['status'], { label: string; intent: Intent }> = {
  sent: { label: 'Sent', intent: 'success' },
  pending: { label: 'Waiting', intent: 'warning' },
  failed: { label: 'Failed', intent: 'danger' },
};

const KIND_LABELS: Record<string, string> = {
  invitation: 'Invitation',
  comment: 'Comment',
  'check-recommended': 'Check recommended',
  'photo-requested': 'Photo requested',
  'photo-added': 'Photo added',
  'case-resolved': 'Case resolved',
  'case-progress': 'Case progress',
  'email-verification': 'Address confirmation',
  'password-reset': 'Password reset',
};

type View = 'text' | 'html';

function RetryButton({ message }: { message: OutboxMessageDto }) {
  const retry = useRetryOutboxMessage();
  const notify = useNotify();
  return (
    <Button
      className="fw-touch"
      variant="outlined"
      intent="danger"
      icon={<RefreshIcon />}
      text="Retry"
      aria-label={`Retry: ${message.subject}`}
      loading={retry.isPending}
      onClick={() =>
        retry.mutate(message.id, {
          onSuccess: () => notify.success(`Queued again: ${message.subject}`),
          onError: (error) => notify.error(`Not queued: ${error.message}`),
        })
      }
    />
  );
}

function MessageItem({ message }: { message: OutboxMessageDto }) {
  const [open, setOpen] = useState(false);
  const [view, setView] = useState<View>('text');
  const status = STATUS[message.status] ?? { label: message.status, intent: 'none' };
  const bodyId = `outbox-body-${message.id}`;
  return (
    <li>
      <Card className="fw-outbox-message" data-kind={message.kind}>
        <div className="fw-outbox-head">
          <Tag minimal round>
            {KIND_LABELS[message.kind] ?? message.kind}
          </Tag>
          <Tag round minimal={message.status === 'sent'} intent={status.intent}>
            {status.label}
          </Tag>
          {message.attempts > 1 && <span className="fw-small fw-muted">{message.attempts} attempts</span>}
        </div>
        <div className="fw-outbox-subject fw-break-word">{message.subject}</div>
        <div className="fw-small fw-break">
          To <strong>{message.toEmail}</strong>
        </div>
        <div className="fw-small fw-muted">
          Queued <time dateTime={message.createdAt}>{when(message.createdAt)}</time>
          {message.sentAt && (
            <>
              {' '}
              · sent <time dateTime={message.sentAt}>{when(message.sentAt)}</time>
            </>
          )}
        </div>
        {message.lastError && message.status !== 'sent' && (
          <Callout intent={message.status === 'failed' ? 'danger' : 'warning'} compact className="fw-outbox-error">
            Last error: <span className="fw-break">{message.lastError}</span>
          </Callout>
        )}
        {message.status === 'failed' && <RetryButton message={message} />}
        <Button
          className="fw-touch fw-outbox-toggle"
          variant="minimal"
          alignText="start"
          icon={open ? <ChevronDownIcon /> : <ChevronRightIcon />}
          text={open ? 'Hide the message' : 'Show the message'}
          aria-expanded={open}
          aria-controls={bodyId}
          onClick={() => setOpen((shown) => !shown)}
        />
        <Collapse isOpen={open}>
          <div id={bodyId} className="fw-outbox-body">
            <SegmentedControl
              aria-label="Part of the message"
              size="large"
              options={[
                { value: 'text', label: 'Plain text' },
                { value: 'html', label: 'HTML' },
              ]}
              value={view}
              onValueChange={(next) => setView(next as View)}
            />
            {view === 'text' ? (
              <pre className="fw-outbox-text">{message.text}</pre>
            ) : (
              // The HTML part in a sandbox: no scripts, no forms, no navigation, no same-origin access.
              <iframe className="fw-outbox-html" title={`HTML part of: ${message.subject}`} sandbox="" srcDoc={message.html} />
            )}
          </div>
        </Collapse>
      </Card>
    </li>
  );
}

/** Admin: the app's outgoing e-mail, newest first; in development the local capture server received it. */
export function OutboxPage() {
  const outbox = useOutbox();
  const flush = useFlushOutbox();
  const notify = useNotify();

  if (outbox.isPending) return <PageSpinner label="Loading the outbox" />;
  if (outbox.error instanceof ApiError && outbox.error.status === 404) {
    return (
      <Page title="Outbox">
        <NonIdealState
          icon={<EnvelopeIcon size={48} />}
          title="The outbox is shown only in development"
          description="A real mail service is configured, so messages go to real inboxes; their links are not shown here."
        />
      </Page>
    );
  }
  if (outbox.isError) {
    return (
      <Page title="Outbox">
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="The outbox could not be loaded"
          description={outbox.error.message}
          action={<Button size="large" text="Try again" onClick={() => void outbox.refetch()} />}
        />
      </Page>
    );
  }

  const { capturing, messages } = outbox.data;
  const waiting = messages.filter((m) => m.status === 'pending').length;
  return (
    <Page
      title={
        <>
          <EnvelopeIcon size={28} className="fw-title-icon" /> Outbox
        </>
      }
      lead={`${messages.length} ${messages.length === 1 ? 'message' : 'messages'}, newest first${waiting > 0 ? `; ${waiting} waiting to be sent` : ''}.`}
      actions={
        <>
          <Button className="fw-touch" size="large" variant="outlined" icon={<RefreshIcon />} text="Refresh" loading={outbox.isFetching && !flush.isPending} onClick={() => void outbox.refetch()} />
          <Button
            className="fw-touch"
            size="large"
            intent="primary"
            icon={<SendMessageIcon />}
            text="Send what is due"
            loading={flush.isPending}
            onClick={() =>
              flush.mutate(undefined, {
                onSuccess: (sent) => notify.success(sent === 0 ? 'Nothing was due.' : `${sent} ${sent === 1 ? 'message' : 'messages'} sent.`),
                onError: (error) => notify.error(`Not sent: ${error.message}`),
              })
            }
          />
        </>
      }
    >
      {capturing ? (
        <Callout intent="primary" compact>
          Development mail: every message goes to the local capture server, not to real inboxes.
        </Callout>
      ) : (
        <Callout intent="warning" compact>
          A real mail service is configured: these messages went to real inboxes.
        </Callout>
      )}
      {messages.length === 0 ? (
        <NonIdealState icon={<EnvelopeIcon size={48} />} title="No e-mail yet" description="Invitations, notices and account e-mails show here once the app queues them." />
      ) : (
        <ul className="fw-outbox-list" aria-label="Messages">
          {messages.map((message) => (
            <MessageItem key={message.id} message={message} />
          ))}
        </ul>
      )}
    </Page>
  );
}
