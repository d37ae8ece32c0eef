import type { ReactNode } from 'react';
import { Tag } from '@blueprintjs/core';
import type { OutcomeDto } from '@fuelwright/shared';
import { formatDateTime, type Labels } from '../lib/labels';

const STILL_FIXED: Record<string, { text: string; intent: 'success' | 'danger' | 'none' }> = {
  true: { text: 'Still fixed', intent: 'success' },
  false: { text: 'Came back', intent: 'danger' },
  null: { text: 'Follow-up not known', intent: 'none' },
};

/** One logged outcome: causes, fix, parts, minutes, follow-up, who and when; `actions` go at the end. */
export function OutcomeEntry({ o, labels, actions }: { o: OutcomeDto; labels: Labels; actions?: ReactNode }) {
  const follow = STILL_FIXED[String(o.stillFixed)];
  const topMatched = o.topCauseId !== null && o.confirmedCauses.includes(o.topCauseId);
  return (
    <article className={o.current ? 'fw-oc-entry' : 'fw-oc-entry fw-oc-entry-old'} aria-label={`Outcome logged ${formatDateTime(o.at)}`}>
      <div className="fw-oc-entry-head">
        <strong className="fw-break-word">{o.confirmedCauses.map(labels.cause).join(' + ')}</strong>
        <span className="fw-oc-tags">
          {!o.current && (
            <Tag minimal round intent="warning">
              Corrected
            </Tag>
          )}
          <Tag minimal round intent={follow.intent}>
            {follow.text}
          </Tag>
          {o.demo && (
            <Tag minimal round>
              Demo
            </Tag>
          )}
        </span>
      </div>
      {o.otherNote && <div className="fw-break-word">“{o.otherNote}”</div>}
      <div className="fw-break-word">
        Fixed by: <strong>{o.fix}</strong>
      </div>
      {(o.parts || o.labourMinutes !== null) && (
        <div className="fw-small fw-break-word">
          {o.parts && <>Parts: {o.parts}</>}
          {o.parts && o.labourMinutes !== null && ' · '}
          {o.labourMinutes !== null && <>{o.labourMinutes} min labour</>}
        </div>
      )}
      {o.topCauseId && (
        <div className="fw-small fw-muted">
          Ranking’s top cause at the start: {labels.cause(o.topCauseId)} {topMatched ? '(right)' : '(not it)'} · version {o.rulesetVersion}
        </div>
      )}
      <div className="fw-small fw-muted">
        {o.loggedByName || 'Someone'} · <time dateTime={o.at}>{formatDateTime(o.at)}</time>
      </div>
      {actions && <div className="fw-oc-entry-actions">{actions}</div>}
    </article>
  );
}
