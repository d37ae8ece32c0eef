import { Button, Callout, H2, HTMLTable, Tag } from '@blueprintjs/core';
import { FloppyDiskIcon, FolderOpenIcon, RefreshIcon, TickCircleIcon } from '@blueprintjs/icons';
import { generatePath } from 'react-router-dom';
import { CHECK_RESULT_LABELS, type CheckResultValue } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import type { WalkThroughSend, WalkThroughSnapshot } from '../hooks/use-walk-through';
import { formatProbability, type CatalogLookup } from './catalog-lookup';
import { StopCallout } from './stop-callout';

const RESULT_INTENT: Record<CheckResultValue, 'danger' | 'success' | 'none'> = {
  'fault-found': 'danger',
  'looks-fine': 'success',
  'not-checked': 'none',
};

/** The end: the outcome, what was reported, every check with its result, the final ranking. */
export function SummaryStep({
  snapshot,
  send,
  lookup,
  saveTo,
}: {
  snapshot: WalkThroughSnapshot;
  send: WalkThroughSend;
  lookup: CatalogLookup;
  /** Quick mode: where "Save this case" leads (sign-up for a visitor), or null when it cannot be saved. */
  saveTo: string | null;
}) {
  const ctx = snapshot.context;
  const top = ctx.rank?.causes.slice(0, 3) ?? [];
  return (
    <div className="fw-diag-step">
      {ctx.notice && <Callout intent="warning">{ctx.notice}</Callout>}
      {ctx.stop ? (
        <StopCallout stop={ctx.stop} checkLabel={lookup.checkLabel(ctx.stop.checkId)} />
      ) : ctx.resolution ? (
        <Callout intent="success" icon={<TickCircleIcon />} title="Fixed" className="fw-diag-outcome">
          <p>
            <strong>{lookup.causeLabel(ctx.resolution.causeId)}</strong>: {ctx.resolution.fix}
          </p>
          {ctx.resolution.note && <p className="fw-muted">{ctx.resolution.note}</p>}
          <p className="fw-small">Before the next run, check that the throttle snaps back to closed by itself.</p>
        </Callout>
      ) : (
        <Callout intent="none" title={ctx.caseState === 'abandoned' ? 'Closed without a fix' : 'Finished without a fix'}>
          {ctx.mode === 'case'
            ? 'The case is closed; every result stays on record.'
            : ctx.results.some((r) => r.result === 'fault-found')
              ? 'A fault was found, but no fix was recorded. Save the case to come back to it, or ask a qualified engine builder.'
              : 'Nothing was found in the checks done. Save the case to come back to it, or ask a qualified engine builder.'}
        </Callout>
      )}

      <section aria-labelledby="summary-symptoms">
        <H2 id="summary-symptoms" className="fw-diag-h2">
          What you reported
        </H2>
        <ul className="fw-diag-plain-list">
          {ctx.symptoms.map((s) => (
            <li key={s.id}>{lookup.symptomText(s)}</li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="summary-checks">
        <H2 id="summary-checks" className="fw-diag-h2">
          Checks done
        </H2>
        {ctx.results.length === 0 ? (
          <p className="fw-muted">No checks recorded.</p>
        ) : (
          <HTMLTable className="fw-diag-results" compact>
            <thead>
              <tr>
                <th scope="col">Check</th>
                <th scope="col">Result</th>
              </tr>
            </thead>
            <tbody>
              {ctx.results.map((r) => (
                <tr key={r.checkId}>
                  <td>
                    {lookup.checkLabel(r.checkId)}
                    {r.note && <div className="fw-muted fw-small fw-break-word">{r.note}</div>}
                  </td>
                  <td>
                    <Tag minimal intent={RESULT_INTENT[r.result]}>
                      {CHECK_RESULT_LABELS[r.result]}
                    </Tag>
                  </td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        )}
      </section>

      {top.length > 0 && !ctx.resolution && !ctx.stop && (
        <section aria-labelledby="summary-causes">
          <H2 id="summary-causes" className="fw-diag-h2">
            Most likely now
          </H2>
          <ul className="fw-diag-plain-list">
            {top.map((c) => (
              <li key={c.id}>
                {c.label}: <strong>{formatProbability(c.probability)}</strong>
              </li>
            ))}
          </ul>
        </section>
      )}

      <div className="fw-diag-actions fw-diag-actions-main">
        {ctx.mode === 'quick' ? (
          <>
            {saveTo && (
              <LinkButton className="fw-touch fw-diag-primary" intent="primary" size="large" icon={<FloppyDiskIcon />} to={saveTo} text="Save this case" />
            )}
            <Button className="fw-touch" size="large" variant="minimal" icon={<RefreshIcon />} text="Start a new diagnosis" onClick={() => send({ type: 'RESTART' })} />
          </>
        ) : (
          ctx.caseId && (
            <>
              <LinkButton
                className="fw-touch fw-diag-primary"
                intent="primary"
                size="large"
                icon={<FolderOpenIcon />}
                to={generatePath(paths.case, { caseId: ctx.caseId })}
                text="Open the case page"
              />
              <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.cases} text="All cases" />
            </>
          )
        )}
      </div>
      {ctx.mode === 'quick' && saveTo && (
        <p className="fw-muted fw-small">Saving keeps the symptoms, the setup and every result as a case on one of your karts.</p>
      )}
    </div>
  );
}
