import { useState, type FormEvent } from 'react';
import { Alert, Button, Callout, FormGroup, SegmentedControl, Spinner, Tag } from '@blueprintjs/core';
import { EnvelopeIcon, PeopleIcon, UndoIcon } from '@blueprintjs/icons';
import { INVITATION_DAYS, type CaseDto, type ShareDto, type ShareScope } from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { useCreateShare } from '../api/create-share';
import { useShares } from '../api/get-shares';
import { useRevokeShare } from '../api/revoke-share';
import { roleLabel } from '../lib/format';
import { ReviewPanel } from './review-panel';

type As = 'coach' | 'shop';
const FIELDS = ['email', 'as', 'scope'] as const;

const STATUS: Record<ShareDto['status'], { label: string; intent: 'success' | 'warning' | 'none' }> = {
  active: { label: 'Has access', intent: 'success' },
  invited: { label: 'Invited', intent: 'warning' },
  revoked: { label: 'Revoked', intent: 'none' },
};

function ShareItem({ share, onRevoke }: { share: ShareDto; onRevoke: (share: ShareDto) => void }) {
  const status = STATUS[share.status];
  const who = share.granteeName ?? share.inviteeEmail;
  return (
    <li>
      <div className="fw-review-row-head">
        <strong className="fw-break">{who}</strong>
        <Tag minimal round>
          {roleLabel(share.as)}
        </Tag>
        <Tag minimal round intent={status.intent}>
          {status.label}
        </Tag>
      </div>
      <div className="fw-small fw-muted fw-break">
        {share.granteeName ? `${share.inviteeEmail} · ` : ''}
        {share.scope === 'kart' ? `Every case on ${share.kartName}` : 'This case'}
      </div>
      <Button
        className="fw-touch fw-review-revoke"
        size="large"
        variant="outlined"
        intent="danger"
        icon={<UndoIcon />}
        text={share.status === 'invited' ? 'Withdraw invitation' : 'Revoke access'}
        aria-label={`${share.status === 'invited' ? 'Withdraw the invitation of' : 'Revoke the access of'} ${who}`}
        onClick={() => onRevoke(share)}
      />
    </li>
  );
}

/**
 * Owner only: invite a coach or shop by e-mail to this case (or every case on the kart), see who
 * has access, and revoke it. The invitee gets a single-use link that works for INVITATION_DAYS days.
 */
export function SharePanel({ c }: { c: CaseDto }) {
  const [email, setEmail] = useState('');
  const [as, setAs] = useState<As>('coach');
  const [scope, setScope] = useState<ShareScope>('case');
  const [revoking, setRevoking] = useState<ShareDto | null>(null);
  const shares = useShares({ kartId: c.kartId });
  const create = useCreateShare();
  const revoke = useRevokeShare();
  const notify = useNotify();
  const errors = formErrors(create.error, FIELDS);
  const relevant = (shares.data ?? []).filter((s) => s.status !== 'revoked' && (s.scope === 'kart' || s.caseId === c.id));

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const address = email.trim();
    create.mutate(scope === 'case' ? { scope, caseId: c.id, email: address, as } : { scope, kartId: c.kartId, email: address, as }, {
      onSuccess: () => {
        notify.success(`Invitation sent to ${address}. The link in it works once, for ${INVITATION_DAYS} days.`);
        setEmail('');
      },
    });
  };

  const confirmRevoke = () => {
    if (!revoking) return;
    const who = revoking.granteeName ?? revoking.inviteeEmail;
    revoke.mutate(revoking.id, {
      onSuccess: () => notify.success(`${who} no longer has access.`),
      onError: (error) => notify.error(`Access of ${who} not revoked: ${error.message}`),
      onSettled: () => setRevoking(null),
    });
  };

  return (
    <ReviewPanel id="review-share" title="Share with a coach or shop" icon={<PeopleIcon size={20} className="fw-title-icon" />} className="fw-review-order-5">
      <p className="fw-muted fw-small fw-review-lead">
        They see this case as you do (symptoms, setup, conditions, every check) and can comment, ask for a photo and recommend the next
        check. They cannot change anything.
      </p>
      {shares.isPending ? (
        <Spinner size={24} aria-label="Loading who has access" />
      ) : shares.isError ? (
        <Callout intent="danger" compact>
          Who has access could not be loaded: {shares.error.message}
        </Callout>
      ) : relevant.length > 0 ? (
        <ul className="fw-review-list" aria-label="Shared with">
          {relevant.map((share) => (
            <ShareItem key={share.id} share={share} onRevoke={setRevoking} />
          ))}
        </ul>
      ) : null}
      <form className="fw-review-form" onSubmit={submit} noValidate aria-label="Share this case">
        <TextField
          id="review-share-email"
          label="Their e-mail"
          type="email"
          inputMode="email"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          value={email}
          onChange={setEmail}
          errors={errors.field('email')}
        />
        <FormGroup label="They are your" labelFor="review-share-as" helperText={errors.field('as').join(' ') || undefined} intent={errors.field('as').length > 0 ? 'danger' : 'none'}>
          <div id="review-share-as">
            <SegmentedControl
              aria-label="They are your"
              size="large"
              fill
              options={[
                { value: 'coach', label: 'Coach' },
                { value: 'shop', label: 'Shop' },
              ]}
              value={as}
              onValueChange={(next) => setAs(next as As)}
            />
          </div>
        </FormGroup>
        <FormGroup
          label="Share"
          labelFor="review-share-scope"
          helperText={scope === 'kart' ? `This case and every case on ${c.kartName}, now and later.` : 'Only this case.'}
        >
          <div id="review-share-scope">
            <SegmentedControl
              aria-label="Share"
              size="large"
              fill
              options={[
                { value: 'case', label: 'This case' },
                { value: 'kart', label: 'The whole kart' },
              ]}
              value={scope}
              onValueChange={(next) => setScope(next as ShareScope)}
            />
          </div>
        </FormGroup>
        {errors.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {errors.form}
          </Callout>
        )}
        <Button
          className="fw-touch fw-review-submit"
          type="submit"
          intent="primary"
          size="large"
          icon={<EnvelopeIcon />}
          text="Send invitation"
          loading={create.isPending}
          disabled={email.trim() === ''}
        />
      </form>
      <Alert
        isOpen={revoking !== null}
        icon={<UndoIcon />}
        intent="danger"
        cancelButtonText="Keep access"
        confirmButtonText={revoking?.status === 'invited' ? 'Withdraw invitation' : 'Revoke access'}
        loading={revoke.isPending}
        onCancel={() => setRevoking(null)}
        onConfirm={confirmRevoke}
        className="fw-dialog"
      >
        {revoking && (
          <p>
            {revoking.granteeName ?? revoking.inviteeEmail}{' '}
            {revoking.status === 'invited' ? 'can no longer use the invitation link.' : 'loses access at once.'}{' '}
            {revoking.scope === 'kart' ? `This ends the share of every case on ${revoking.kartName}.` : ''} Comments and photos stay on the case.
          </p>
        )}
      </Alert>
    </ReviewPanel>
  );
}
