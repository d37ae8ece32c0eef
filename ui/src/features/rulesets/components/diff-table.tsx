import { useState } from 'react';
import { Button, HTMLTable, InputGroup, SegmentedControl, Tag } from '@blueprintjs/core';
import { SearchIcon } from '@blueprintjs/icons';
import { filterRows, formatChange, formatInterval, formatWeight, ruleLabel, sortRows, type DiffRow, type DiffShow } from '../lib/diff';

const PAGE = 20;

/**
 * The proposal as a diff: each weight's old and proposed value with its evidence (the outcomes
 * behind it and the 90 % credible interval). Changed ones first, those the outcomes contradict
 * at the top; filter by what changed and by name or cause.
 */
export function DiffTable({
  id,
  rows,
  causeLabel,
  symptomLabel = () => undefined,
  kind,
}: {
  id: string;
  rows: readonly DiffRow[];
  causeLabel: (id: string) => string;
  /** A symptom's label, to name rules in words (undefined for an id that is not a symptom). */
  symptomLabel?: (id: string) => string | undefined;
  kind: 'prior' | 'rule';
}) {
  const [show, setShow] = useState<DiffShow>('changed');
  const [text, setText] = useState('');
  const [limit, setLimit] = useState(PAGE);
  const sorted = sortRows(rows);
  const shown = filterRows(sorted, show, text, causeLabel, (r) => (r.kind === 'rule' ? ruleLabel(r.id, symptomLabel) : ''));
  const changed = rows.filter((r) => r.changed).length;
  const disagrees = rows.filter((r) => r.disagrees).length;
  return (
    <div className="fw-rs-diff">
      <div className="fw-rs-diff-filters">
        <SegmentedControl
          aria-label={kind === 'prior' ? 'Cause priors shown' : 'Rules shown'}
          size="large"
          options={[
            { value: 'changed', label: 'Changed' },
            { value: 'disagrees', label: 'Disagree' },
            { value: 'all', label: 'All' },
          ]}
          value={show}
          onValueChange={(v) => {
            setShow(v as DiffShow);
            setLimit(PAGE);
          }}
        />
        <InputGroup
          id={`${id}-search`}
          aria-label={kind === 'prior' ? 'Find a cause' : 'Find a rule or cause'}
          size="large"
          leftIcon={<SearchIcon />}
          placeholder={kind === 'prior' ? 'Find a cause' : 'Find a rule or cause'}
          value={text}
          onValueChange={(v) => {
            setText(v);
            setLimit(PAGE);
          }}
        />
      </div>
      <p className="fw-muted fw-small fw-rs-count" role="status">
        {shown.length === rows.length ? `${rows.length} shown` : `${shown.length} of ${rows.length} shown`}
        {shown.length > limit ? `; the first ${limit} below` : ''}. {changed} changed; the outcomes disagree with {disagrees} old{' '}
        {disagrees === 1 ? 'value' : 'values'} (outside the 90 % interval).
      </p>
      {shown.length > 0 && (
        <div className="fw-rs-scroll">
          <HTMLTable compact striped bordered={false} className="fw-rs-table fw-rs-diff-table" aria-labelledby={id}>
            <thead>
              <tr>
                <th scope="col">{kind === 'prior' ? 'Cause' : 'Rule'}</th>
                <th scope="col" className="fw-rs-num">
                  Old → proposed
                </th>
                <th scope="col">Evidence</th>
              </tr>
            </thead>
            <tbody>
              {shown.slice(0, limit).map((r) => (
                <tr key={r.id} className={r.changed ? undefined : 'fw-rs-unchanged'}>
                  <td className="fw-break-word">
                    {kind === 'prior' ? (
                      <strong>{causeLabel(r.cause)}</strong>
                    ) : (
                      <>
                        <strong>{ruleLabel(r.id, symptomLabel)}</strong>
                        <div className="fw-small">for {causeLabel(r.cause)}</div>
                        <code className="fw-rs-rule fw-muted">{r.id}</code>
                      </>
                    )}
                  </td>
                  <td className="fw-rs-num fw-nowrap" data-label="Old → proposed">
                    <span className="fw-muted">{formatWeight(r.old)}</span> → <strong>{formatWeight(r.proposed)}</strong>
                    <div className="fw-small">{r.changed ? formatChange(r.old, r.proposed) : 'unchanged'}</div>
                  </td>
                  <td>
                    <div>
                      {r.outcomes.toLocaleString()} {r.outcomes === 1 ? 'outcome' : 'outcomes'}
                      {r.causeOutcomes !== undefined && <span className="fw-muted fw-small"> ({formatWeight(r.causeOutcomes)} of its cause)</span>}
                    </div>
                    <div className="fw-small">90 % interval {formatInterval(r.interval)}</div>
                    <div className="fw-rs-tags">
                      {r.disagrees && (
                        <Tag minimal round intent="warning">
                          Outcomes disagree with the old value
                        </Tag>
                      )}
                      {r.kept && (
                        <Tag minimal round>
                          Kept: no outcome of its cause
                        </Tag>
                      )}
                      {r.flat && (
                        <Tag minimal round intent="primary">
                          Near 1: candidate for removal
                        </Tag>
                      )}
                    </div>
                  </td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      )}
      {shown.length > limit && (
        <Button className="fw-touch" variant="outlined" text={`Show ${Math.min(PAGE, shown.length - limit)} more`} onClick={() => setLimit((n) => n + PAGE)} />
      )}
    </div>
  );
}
