import { Button, Callout, Card, H2, HTMLTable, Spinner, Tag } from '@blueprintjs/core';
import { generatePath, Link } from 'react-router-dom';
import type { BackTestFigures, ProposalSummaryDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useProposals } from '../api/get-proposals';
import { pct, when } from '../lib/format';
import { PROPOSAL_STATUS } from '../lib/proposal-status';

function Status({ p, active }: { p: ProposalSummaryDto; active: string }) {
  const status = PROPOSAL_STATUS[p.status];
  return (
    <div className="fw-rs-status">
      <span className="fw-rs-tags">
        <Tag round intent={status.intent}>
          {p.status === 'running' ? `${status.label}: ${Math.round(p.progress * 100)} %` : status.label}
        </Tag>
        {p.status === 'published' && p.proposedVersion === active && (
          <Tag round minimal intent="success">
            Active
          </Tag>
        )}
      </span>
      {p.status === 'published' && <div className="fw-small">Became version {p.proposedVersion}</div>}
      {p.status === 'failed' && p.error && <div className="fw-small fw-muted fw-break-word">{p.error}</div>}
    </div>
  );
}

/** Top-3 before and after on the held-out outcomes, with the change; top-1 underneath. */
function BackTestCell({ p }: { p: ProposalSummaryDto }) {
  const bt = p.backTest;
  if (!bt) return <span className="fw-muted">{p.status === 'running' ? 'Not yet' : '—'}</span>;
  const line = (pick: (f: BackTestFigures) => number) => `${pct(pick(bt.before))} → ${pct(pick(bt.after))}`;
  const d = bt.after.top3Rate - bt.before.top3Rate;
  return (
    <div className="fw-rs-backtest">
      <span className="fw-nowrap">
        Top 3: <strong>{line((f) => f.top3Rate)}</strong>
      </span>{' '}
      {Math.abs(d) < 1e-9 ? (
        <span className="fw-muted fw-small">no change</span>
      ) : (
        <Tag minimal round intent={d > 0 ? 'success' : 'danger'}>
          {d > 0 ? '+' : '−'}
          {Math.abs(d * 100).toFixed(1)} points
        </Tag>
      )}
      <div className="fw-small fw-muted fw-nowrap">Top 1: {line((f) => f.top1Rate)}</div>
      <div className="fw-small fw-muted">on {bt.scored.toLocaleString()} held-out outcomes</div>
    </div>
  );
}

const started = (p: ProposalSummaryDto) => `${when(p.createdAt)} by ${p.createdByName ?? 'a former user'}`;

/**
 * The proposals made so far, newest first: status, when and by whom, strength, and the back-test's
 * top-3 before and after once ready; each opens its page. On a phone the status and who started it
 * sit under the version, leaving two columns.
 */
export function ProposalList({ active }: { active: string }) {
  const proposals = useProposals();
  const phone = useMediaQuery('(max-width: 767px)');

  return (
    <Card className="fw-rs-panel" role="region" aria-labelledby="rs-proposals">
      <H2 id="rs-proposals" className="fw-rs-panel-title">
        Proposals
      </H2>
      {proposals.isPending && <Spinner size={24} aria-label="Loading proposals" />}
      {proposals.isError && (
        <Callout intent="danger" compact>
          Proposals could not be loaded: {proposals.error.message}{' '}
          <Button variant="minimal" text="Try again" onClick={() => void proposals.refetch()} />
        </Callout>
      )}
      {proposals.data?.length === 0 && <p className="fw-muted fw-rs-lead">No proposals yet. Propose new weights below to start one.</p>}
      {proposals.data && proposals.data.length > 0 && (
        <>
          <p className="fw-muted fw-small fw-rs-lead">Newest first. Open one for its back-test and every weight it changes.</p>
          <div className="fw-rs-scroll">
            <HTMLTable striped className="fw-rs-table" aria-label="Proposals">
              <thead>
                <tr>
                  <th scope="col">Proposal</th>
                  {!phone && <th scope="col">Status</th>}
                  <th scope="col">Held-out back-test</th>
                  {!phone && <th scope="col">Started</th>}
                  {!phone && (
                    <th scope="col" className="fw-rs-num">
                      Strength
                    </th>
                  )}
                </tr>
              </thead>
              <tbody>
                {proposals.data.map((p) => (
                  <tr key={p.id}>
                    <td>
                      <Link className="fw-rs-proposal-link" to={generatePath(paths.rulesetProposal, { proposalId: p.id })}>
                        Version {p.proposedVersion}
                      </Link>
                      <div className="fw-small fw-muted">from {p.baseVersion}</div>
                      {phone && (
                        <>
                          <Status p={p} active={active} />
                          <div className="fw-small fw-muted">
                            {started(p)} · strength {p.strength.toLocaleString()}
                          </div>
                        </>
                      )}
                    </td>
                    {!phone && (
                      <td>
                        <Status p={p} active={active} />
                      </td>
                    )}
                    <td>
                      <BackTestCell p={p} />
                    </td>
                    {!phone && (
                      <td>
                        <span className="fw-nowrap">{when(p.createdAt)}</span>
                        <div className="fw-small fw-muted fw-break-word">by {p.createdByName ?? 'a former user'}</div>
                      </td>
                    )}
                    {!phone && <td className="fw-rs-num">{p.strength.toLocaleString()}</td>}
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          </div>
        </>
      )}
    </Card>
  );
}
