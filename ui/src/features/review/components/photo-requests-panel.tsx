import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, HTMLSelect, Spinner, Tag } from '@blueprintjs/core';
import { CameraIcon } from '@blueprintjs/icons';
import type { CaseDto, PhotoDto, PhotoRequestDto } from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { usePhotoRequests } from '../api/get-photo-requests';
import { usePhotos } from '../api/get-photos';
import { useRequestPhoto } from '../api/request-photo';
import { formatWhen } from '../lib/format';
import { PhotoUploadForm } from './photo-upload-form';
import { ReviewPanel } from './review-panel';

const WHAT_MAX_LENGTH = 300;
const FIELDS = ['what', 'checkId'] as const;

function RequestItem({
  request,
  photo,
  caseId,
  canAnswer,
  checkLabel,
}: {
  request: PhotoRequestDto;
  photo: PhotoDto | undefined;
  caseId: string;
  canAnswer: boolean;
  checkLabel: (id: string) => string;
}) {
  const [answering, setAnswering] = useState(false);
  const answered = request.fulfilledByPhotoId !== null;
  return (
    <li>
      <div className="fw-review-row-head">
        <strong className="fw-break-word">{request.what}</strong>
        <Tag minimal round intent={answered ? 'success' : 'warning'}>
          {answered ? 'Answered' : 'Waiting for a photo'}
        </Tag>
      </div>
      {request.checkId && <div className="fw-small">For the check “{checkLabel(request.checkId)}”</div>}
      <div className="fw-small fw-muted">
        Asked by {request.requestedByName} · <time dateTime={request.createdAt}>{formatWhen(request.createdAt)}</time>
      </div>
      {answered && photo && (
        <a className="fw-photo-link fw-photo-answer" href={photo.url} target="_blank" rel="noopener" aria-label={`Open the photo that answers: ${request.what}`}>
          <img src={photo.thumbUrl} alt={photo.caption || request.what} loading="lazy" />
        </a>
      )}
      {!answered && canAnswer &&
        (answering ? (
          <PhotoUploadForm
            caseId={caseId}
            photoRequestId={request.id}
            checkId={request.checkId}
            idPrefix={`review-answer-${request.id}`}
            onUploaded={() => setAnswering(false)}
            onCancel={() => setAnswering(false)}
          />
        ) : (
          <Button className="fw-touch fw-review-answer" size="large" intent="primary" icon={<CameraIcon />} text="Answer with a photo" onClick={() => setAnswering(true)} />
        ))}
    </li>
  );
}

function AskForPhotoForm({ c, checkLabel }: { c: CaseDto; checkLabel: (id: string) => string }) {
  const [what, setWhat] = useState('');
  const [checkId, setCheckId] = useState('');
  const ask = useRequestPhoto(c.id);
  const notify = useNotify();
  const errors = formErrors(ask.error, FIELDS);
  const checks = [...new Set([...c.rank.plan.map((step) => step.checkId), ...c.results.map((r) => r.checkId)])];

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    ask.mutate(
      { what: what.trim(), ...(checkId ? { checkId } : {}) },
      {
        onSuccess: () => {
          notify.success(`Asked ${c.ownerName} for a photo. They get an e-mail.`);
          setWhat('');
          setCheckId('');
        },
      },
    );
  };

  return (
    <form className="fw-review-form" onSubmit={submit} noValidate aria-label="Ask for a photo">
      <TextField
        id="review-photo-what"
        label="What the photo should show"
        maxLength={WHAT_MAX_LENGTH}
        value={what}
        onChange={setWhat}
        errors={errors.field('what')}
        placeholder="The foam blocks, out of the bowl"
      />
      <FormGroup label="For a check (optional)" labelFor="review-photo-check" helperText={errors.field('checkId').join(' ') || undefined} intent={errors.field('checkId').length > 0 ? 'danger' : 'none'}>
        <HTMLSelect
          id="review-photo-check"
          large
          fill
          value={checkId}
          onChange={(event) => setCheckId(event.currentTarget.value)}
          options={[{ value: '', label: 'No particular check' }, ...checks.map((id) => ({ value: id, label: checkLabel(id) }))]}
        />
      </FormGroup>
      {errors.form && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {errors.form}
        </Callout>
      )}
      <Button className="fw-touch fw-review-submit" type="submit" intent="primary" size="large" icon={<CameraIcon />} text="Ask for a photo" loading={ask.isPending} disabled={what.trim() === ''} />
    </form>
  );
}

/**
 * Photo requests: a coach or shop asks for one (`canAsk`); the racer answers each with an upload
 * (`canAnswer`). Hidden for the racer while there are none.
 */
export function PhotoRequestsPanel({ c, canAsk, canAnswer, checkLabel }: { c: CaseDto; canAsk: boolean; canAnswer: boolean; checkLabel: (id: string) => string }) {
  const requests = usePhotoRequests(c.id);
  const photos = usePhotos(c.id);
  if (!canAsk && (!requests.data || requests.data.length === 0)) return null;
  const byId = new Map((photos.data ?? []).map((p) => [p.id, p]));
  const pending = requests.data?.filter((r) => r.fulfilledByPhotoId === null).length ?? 0;
  return (
    <ReviewPanel
      id="review-photo-requests"
      title={pending > 0 && canAnswer ? `Photos asked for (${pending})` : 'Photos asked for'}
      icon={<CameraIcon size={20} className="fw-title-icon" />}
      className={pending > 0 && canAnswer ? 'fw-review-attention fw-review-order-0' : 'fw-review-order-3'}
    >
      {requests.isPending ? (
        <Spinner size={24} aria-label="Loading photo requests" />
      ) : requests.isError ? (
        <Callout intent="danger" compact>
          The photo requests could not be loaded: {requests.error.message}
        </Callout>
      ) : requests.data.length === 0 ? (
        <p className="fw-muted">Nothing asked for yet.</p>
      ) : (
        <ul className="fw-review-list" aria-label="Photo requests">
          {requests.data.map((request) => (
            <RequestItem
              key={request.id}
              request={request}
              photo={request.fulfilledByPhotoId ? byId.get(request.fulfilledByPhotoId) : undefined}
              caseId={c.id}
              canAnswer={canAnswer}
              checkLabel={checkLabel}
            />
          ))}
        </ul>
      )}
      {canAsk && <AskForPhotoForm c={c} checkLabel={checkLabel} />}
    </ReviewPanel>
  );
}
