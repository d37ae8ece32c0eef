import { useState, type FormEvent } from 'react';
import { Button, Callout, FormGroup, HTMLSelect, Tag } from '@blueprintjs/core';
import { ThumbsUpIcon } from '@blueprintjs/icons';
import type { CaseDto } from '@fuelwright/shared';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { useRecommendCheck } from '../api/recommend-check';
import { formatWhen } from '../lib/format';
import { ReviewPanel } from './review-panel';
import { TextAreaField } from './text-area-field';

const REASON_MAX_LENGTH = 500;
const FIELDS = ['checkId', 'reason'] as const;

/** What was recommended on this case so far, newest first. */
export function RecommendationList({ c, checkLabel }: { c: CaseDto; checkLabel: (id: string) => string }) {
  if (c.recommendations.length === 0) return null;
  const newestFirst = [...c.recommendations].reverse();
  return (
    <ul className="fw-review-list" aria-label="Recommended checks">
      {newestFirst.map((r) => (
        <li key={`${r.checkId}-${r.at}`}>
          <div className="fw-review-row-head">
            <strong className="fw-break-word">{checkLabel(r.checkId)}</strong>
            <Tag minimal round intent={r.pending ? 'warning' : 'success'}>
              {r.pending ? 'Not done yet' : 'Done'}
            </Tag>
          </div>
          <p className="fw-comment-body">{r.reason}</p>
          <div className="fw-small fw-muted">
            {r.byName} · <time dateTime={r.at}>{formatWhen(r.at)}</time>
          </div>
        </li>
      ))}
    </ul>
  );
}

/**
 * For a coach or shop the case is shared with: put one of the checks still to do at the top of the
 * racer's plan, with the reason. The racer sees it as coming from them and is e-mailed.
 */
export function RecommendCheckPanel({ c, checkLabel, onCase }: { c: CaseDto; checkLabel: (id: string) => string; onCase: (c: CaseDto) => void }) {
  const plan = c.rank.plan;
  const [checkId, setCheckId] = useState(plan[0]?.checkId ?? '');
  const [reason, setReason] = useState('');
  const recommend = useRecommendCheck(c.id, onCase);
  const notify = useNotify();
  const errors = formErrors(recommend.error, FIELDS);
  const checkErrors = errors.field('checkId');
  const chosen = plan.some((step) => step.checkId === checkId) ? checkId : (plan[0]?.checkId ?? '');

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    recommend.mutate(
      { checkId: chosen, reason: reason.trim() },
      {
        onSuccess: () => {
          notify.success(`Recommended. “${checkLabel(chosen)}” now leads ${c.ownerName}’s plan.`);
          setReason('');
        },
      },
    );
  };

  return (
    <ReviewPanel id="review-recommend" title="Recommend the next check" icon={<ThumbsUpIcon size={20} className="fw-title-icon" />} className="fw-review-order-1">
      {plan.length === 0 ? (
        <p className="fw-muted">No checks are left in the plan.</p>
      ) : (
        <form className="fw-review-form" onSubmit={submit} noValidate aria-label="Recommend a check">
          <p className="fw-muted fw-small fw-review-lead">It goes to the top of {c.ownerName}’s plan, with your reason and your name.</p>
          <FormGroup
            label="Check"
            labelFor="review-recommend-check"
            intent={checkErrors.length > 0 ? 'danger' : 'none'}
            helperText={checkErrors.length > 0 ? checkErrors.join(' ') : undefined}
          >
            <HTMLSelect
              id="review-recommend-check"
              large
              fill
              value={chosen}
              onChange={(event) => setCheckId(event.currentTarget.value)}
              options={plan.map((step, index) => ({
                value: step.checkId,
                label: `${index + 1}. ${checkLabel(step.checkId) || step.label} (${step.minutes + step.openingMinutes} min)`,
              }))}
            />
          </FormGroup>
          <TextAreaField
            id="review-recommend-reason"
            label="Why this check next"
            value={reason}
            onChange={setReason}
            maxLength={REASON_MAX_LENGTH}
            errors={errors.field('reason')}
            rows={2}
          />
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
            icon={<ThumbsUpIcon />}
            text="Recommend this check"
            loading={recommend.isPending}
            disabled={reason.trim() === ''}
          />
        </form>
      )}
      <RecommendationList c={c} checkLabel={checkLabel} />
    </ReviewPanel>
  );
}
