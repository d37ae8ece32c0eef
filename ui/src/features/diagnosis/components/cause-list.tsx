import { useState } from 'react';
import { Button, Collapse, ProgressBar } from '@blueprintjs/core';
import { ArrowDownIcon, ArrowUpIcon, ChevronDownIcon, ChevronUpIcon } from '@blueprintjs/icons';
import type { RankResponse, ReasonDto } from '@fuelwright/shared';
import type { CauseProbability } from '../machines/walk-through-model';
import { formatProbability } from './catalog-lookup';

const SHOWN = 5;

/** Change in percentage points since the last step, when it is worth saying. */
function Change({ now, before }: { now: number; before: number | undefined }) {
  if (before === undefined) return null;
  const points = Math.round((now - before) * 100);
  if (points === 0) return <span />;
  const up = points > 0;
  return (
    <span className={up ? 'fw-diag-change fw-diag-change-up' : 'fw-diag-change fw-diag-change-down'}>
      {up ? <ArrowUpIcon size={12} /> : <ArrowDownIcon size={12} />} {up ? 'up' : 'down'} {Math.abs(points)} points
    </span>
  );
}

function reasonTone(reason: ReasonDto): string {
  if (reason.likelihoodRatio > 1) return 'makes it more likely';
  if (reason.likelihoodRatio < 1) return 'makes it less likely';
  return 'no effect';
}

function CauseRow({
  id,
  label,
  probability,
  before,
  reasons,
  top,
}: {
  id: string;
  label: string;
  probability: number;
  before: number | undefined;
  reasons: ReasonDto[];
  top: boolean;
}) {
  const [open, setOpen] = useState(false);
  const reasonsId = `reasons-${id}`;
  return (
    <li className={top ? 'fw-diag-cause fw-diag-cause-top' : 'fw-diag-cause'} data-cause={id} data-probability={probability.toFixed(4)}>
      <div className="fw-diag-cause-head">
        <span className="fw-diag-cause-label">{label}</span>
        <span className="fw-diag-cause-number" aria-label={`${formatProbability(probability)} likely`}>
          {formatProbability(probability)}
        </span>
      </div>
      <div className="fw-diag-bar-row">
        <ProgressBar
          className="fw-diag-bar"
          value={Math.max(0.01, probability)}
          intent={top ? 'primary' : 'none'}
          animate={false}
          stripes={false}
          aria-hidden="true"
        />
      </div>
      <div className="fw-diag-cause-foot">
        <Change now={probability} before={before} />
        {reasons.length > 0 && (
          <Button
            className="fw-diag-why"
            variant="minimal"
            size="small"
            aria-expanded={open}
            aria-controls={reasonsId}
            endIcon={open ? <ChevronUpIcon /> : <ChevronDownIcon />}
            text={open ? 'Hide why' : `Why? (${reasons.length})`}
            onClick={() => setOpen(!open)}
          />
        )}
      </div>
      <Collapse isOpen={open}>
        <ul id={reasonsId} className="fw-diag-reasons">
          {reasons.map((reason, i) => (
            <li key={`${reason.ruleId ?? reason.checkId ?? reason.symptomId ?? ''}-${i}`} className={reason.likelihoodRatio >= 1 ? 'fw-diag-reason-up' : 'fw-diag-reason-down'}>
              <span>{reason.text}</span> <span className="fw-muted fw-small">({reasonTone(reason)})</span>
            </li>
          ))}
        </ul>
      </Collapse>
    </li>
  );
}

/** The causes as bars with their number, the reasons of each behind "Why?". */
export function CauseList({ rank, previous }: { rank: RankResponse; previous: CauseProbability[] | null }) {
  const [all, setAll] = useState(false);
  const before = new Map(previous?.map((c) => [c.id, c.probability]) ?? []);
  const causes = all ? rank.causes : rank.causes.slice(0, SHOWN);
  return (
    <div className="fw-diag-causes-wrap">
      <ol className="fw-diag-causes" aria-label="Likely causes, most likely first">
        {causes.map((cause, i) => (
          <CauseRow
            key={cause.id}
            id={cause.id}
            label={cause.label}
            probability={cause.probability}
            before={previous ? (before.get(cause.id) ?? 0) : undefined}
            reasons={cause.reasons}
            top={i === 0}
          />
        ))}
        {all && (
          <CauseRow
            id="something-else"
            label={rank.somethingElse.label}
            probability={rank.somethingElse.probability}
            before={undefined}
            reasons={[]}
            top={false}
          />
        )}
      </ol>
      {rank.causes.length > SHOWN && (
        <Button
          className="fw-touch"
          variant="minimal"
          endIcon={all ? <ChevronUpIcon /> : <ChevronDownIcon />}
          text={all ? 'Show the top causes only' : `Show all ${rank.causes.length} causes`}
          onClick={() => setAll(!all)}
        />
      )}
      {!all && (
        <p className="fw-muted fw-small">
          {rank.somethingElse.label}: {formatProbability(rank.somethingElse.probability)}.
        </p>
      )}
      {rank.excluded.length > 0 && (
        <p className="fw-muted fw-small">
          Left out, as they cannot happen on this carburettor: {rank.excluded.map((c) => c.label).join('; ')}.
        </p>
      )}
    </div>
  );
}
