import { useState } from 'react';
import { Alert, Button, Callout, Card, FormGroup, H2, HTMLTable, NonIdealState, ProgressBar, Tag, TextArea } from '@blueprintjs/core';
import { ErrorIcon, LockIcon, TickCircleIcon, UploadIcon } from '@blueprintjs/icons';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { isApiError } from '../../../lib/api-client';
import { useRequiredUser } from '../../../lib/current-user';
import { useCatalog } from '../../../lib/catalog';
import { useProposal, type Accuracy, type Proposal, type ProposalResult } from '../api/get-proposal';
import { usePublishProposal } from '../api/publish-proposal';
import { priorRows, ruleRows } from '../lib/diff';
import { pct } from '../lib/format';
import { PROPOSAL_STATUS } from '../lib/proposal-status';
import { DiffTable } from './diff-table';
import '../rulesets.css';

const score = (x: number | null) => (x === null || !Number.isFinite(x) ? '—' : x.toFixed(3));

function delta(before: number | null, after: number | null, asPercent: boolean, lowerIsBetter = false) {
  if (before === null || after === null || !Number.isFinite(before) || !Number.isFinite(after)) return <span className="fw-muted">—</span>;
  const d = after - before;
  const better = lowerIsBetter ? d < 0 : d > 0;
  const text = asPercent ? `${d >= 0 ? '+' : '−'}${Math.abs(d * 100).toFixed(1)} points` : `${d >= 0 ? '+' : '−'}${Math.abs(d).toFixed(3)}`;
  if (Math.abs(d) < 1e-9) return <span className="fw-muted">no change</span>;
  return (
    <Tag minimal round intent={better ? 'success' : 'danger'}>
      {text} {better ? '(better)' : '(worse)'}
    </Tag>
  );
}

function BackTest({ result }: { result: ProposalResult }) {
  const { before, after, heldOut, scored } = result.backTest;
  const rows: { label: string; pick: (a: Accuracy) => number | null; percent: boolean; lower?: boolean }[] = [
    { label: 'Top cause right (top-1)', pick: (a) => a.top1Rate, percent: true },
    { label: 'Right cause in the top three (top-3)', pick: (a) => a.top3Rate, percent: true },
    { label: 'Brier score (lower is better)', pick: (a) => a.brier, percent: false, lower: true },
  ];
  return (
    <>
      <p className="fw-muted fw-rs-lead">
        Ranked {scored.toLocaleString()} of the {heldOut.toLocaleString()} held-out outcomes (left out of the fit) under the current weights
        ({result.fromVersion}) and under the proposal ({result.version}).
      </p>
      <div className="fw-rs-scroll">
        <HTMLTable striped className="fw-rs-table" aria-label="Back-test">
          <thead>
            <tr>
              <th scope="col">On held-out outcomes</th>
              <th scope="col" className="fw-rs-num">
                Before
              </th>
              <th scope="col" className="fw-rs-num">
                After
              </th>
              <th scope="col" className="fw-hide-on-phone">
                Change
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const b = r.pick(before);
              const a = r.pick(after);
              return (
                <tr key={r.label}>
                  <th scope="row" className="fw-rs-row-head">
                    {r.label}
                    <div className="fw-rs-phone-only">{delta(b, a, r.percent, r.lower)}</div>
                  </th>
                  <td className="fw-rs-num">{r.percent ? pct(b ?? NaN) : score(b)}</td>
                  <td className="fw-rs-num">
                    <strong>{r.percent ? pct(a ?? NaN) : score(a)}</strong>
                  </td>
                  <td className="fw-hide-on-phone">{delta(b, a, r.percent, r.lower)}</td>
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
      </div>
    </>
  );
}

function Progress({ p }: { p: Proposal }) {
  const running = p.status === 'running';
  const value = running ? p.progress : 1;
  return (
    <div className="fw-rs-progress">
      <div className="fw-rs-progress-label" id="proposal-progress-label">
        {running ? `Fitting and back-testing: ${Math.round(p.progress * 100)} %` : p.status === 'failed' ? 'Stopped' : 'Ready'}
      </div>
      <ProgressBar
        value={value}
        intent={p.status === 'failed' ? 'danger' : running ? 'primary' : 'success'}
        animate={running}
        stripes={running}
        aria-label="Proposal progress"
        aria-describedby="proposal-progress-label"
      />
    </div>
  );
}

/** One proposal: its progress while it runs, then the back-test and the diff; admins publish it. */
export function ProposalPage() {
  const { proposalId = '' } = useParams();
  const user = useRequiredUser();
  const admin = user.role === 'admin';
  const proposal = useProposal(proposalId);
  const catalog = useCatalog();
  const publish = usePublishProposal();
  const notify = useNotify();
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  const [notes, setNotes] = useState('');

  if (proposal.isPending) return <PageSpinner label="Loading the proposal" />;
  if (proposal.isError) {
    const missing = isApiError(proposal.error) && (proposal.error.status === 404 || proposal.error.status === 400);
    return (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title={missing ? 'Proposal not found' : 'The proposal could not be loaded'}
        description={missing ? 'Check the address, or propose new weights again.' : proposal.error.message}
        action={<LinkButton className="fw-touch" size="large" to={paths.rulesets} text="Back to rulesets" />}
      />
    );
  }

  const p = proposal.data;
  const r = p.result;
  const causes = new Map((catalog.data?.causes ?? []).map((c) => [c.id, c.label]));
  const causeLabel = (id: string) => (id === SOMETHING_ELSE_ID ? (catalog.data?.somethingElse.label ?? 'Something else') : (causes.get(id) ?? id));
  const symptoms = new Map((catalog.data?.symptoms ?? []).map((s) => [s.id, s.label]));

  return (
    <Page
      title={`Proposal for version ${p.proposedVersion}`}
      lead={`Re-fitted from version ${p.baseVersion} at strength ${p.strength}, with ${Math.round(p.holdOutFraction * 100)} % of the outcomes held out for the back-test.`}
      actions={
        p.status === 'ready' && admin ? (
          <Button className="fw-touch" size="large" intent="primary" icon={<UploadIcon />} text={`Publish as ${p.proposedVersion}`} onClick={() => setConfirming(true)} />
        ) : undefined
      }
    >
      <p className="fw-back-link">
        <Link to={paths.rulesets}>← Rulesets</Link>
      </p>
      <Card className="fw-rs-panel" role="region" aria-labelledby="rs-status">
        <H2 id="rs-status" className="fw-rs-panel-title">
          Status{' '}
          <Tag round intent={PROPOSAL_STATUS[p.status].intent}>
            {PROPOSAL_STATUS[p.status].label}
          </Tag>
        </H2>
        <Progress p={p} />
        {p.status === 'running' && (
          <p className="fw-muted fw-small fw-rs-lead">The fit runs on the server: you can leave this page and come back to its address.</p>
        )}
        {p.status === 'failed' && (
          <Callout intent="danger" title="The fit stopped">
            {p.error ?? 'No reason was given.'}
          </Callout>
        )}
        {p.status === 'published' && (
          <Callout intent="success" icon={<TickCircleIcon size={20} />}>
            Published as version {p.proposedVersion}. <Link to={paths.rulesets}>See the versions</Link>.
          </Callout>
        )}
        {p.status === 'ready' && !admin && (
          <Callout intent="primary" icon={<LockIcon size={20} />}>
            Only an admin can publish a proposal. Send this page’s address to an admin to review and publish it.
          </Callout>
        )}
        {r && (
          <p className="fw-muted fw-small fw-rs-lead">
            Fitted on {r.fit.outcomes.toLocaleString()} of {r.fit.read.toLocaleString()} outcomes read
            {r.fit.skipped.notStillFixed > 0 && `; ${r.fit.skipped.notStillFixed.toLocaleString()} left out because the fix did not hold`}
            {r.fit.skipped.noKnownCause > 0 && `; ${r.fit.skipped.noKnownCause.toLocaleString()} with no known cause`}. {r.changedPriors} priors and{' '}
            {r.changedRules} rule ratios change.
          </p>
        )}
      </Card>

      {r && (
        <>
          <Card className="fw-rs-panel" role="region" aria-labelledby="rs-backtest">
            <H2 id="rs-backtest" className="fw-rs-panel-title">
              Back-test: before and after
            </H2>
            <BackTest result={r} />
          </Card>
          <Card className="fw-rs-panel" role="region" aria-labelledby="rs-priors">
            <H2 id="rs-priors" className="fw-rs-panel-title">
              Cause priors
            </H2>
            <p className="fw-muted fw-small fw-rs-lead">How common each cause is before any symptom is known (the catalog’s weights).</p>
            <DiffTable id="rs-priors" rows={priorRows(r.priors)} causeLabel={causeLabel} kind="prior" />
          </Card>
          <Card className="fw-rs-panel" role="region" aria-labelledby="rs-rules">
            <H2 id="rs-rules" className="fw-rs-panel-title">
              Rule likelihood ratios
            </H2>
            <p className="fw-muted fw-small fw-rs-lead">
              How much each rule, when it fires, raises (above 1) or lowers (below 1) the odds of its cause.
            </p>
            <DiffTable id="rs-rules" rows={ruleRows(r.rules)} causeLabel={causeLabel} symptomLabel={(id) => symptoms.get(id)} kind="rule" />
          </Card>
        </>
      )}

      <Alert
        isOpen={confirming}
        icon={<UploadIcon size={32} />}
        intent="primary"
        confirmButtonText={`Publish ${p.proposedVersion}`}
        cancelButtonText="Cancel"
        loading={publish.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          publish.mutate(
            { id: p.id, notes: notes.trim() || undefined },
            {
              onSuccess: () => {
                setConfirming(false);
                notify.success(`Version ${p.proposedVersion} published. New cases are ranked with it.`);
                navigate(paths.rulesets);
              },
              onError: (e) => {
                setConfirming(false);
                notify.error(`Not published: ${e.message}`);
              },
            },
          )
        }
      >
        <p>
          Publish these weights as version <strong>{p.proposedVersion}</strong> and make it the active version?
        </p>
        <p>New cases will be ranked with it. A published version never changes; cases already opened keep their version, and you can roll back at any time.</p>
        <FormGroup label="Notes (optional)" labelFor="publish-notes">
          <TextArea id="publish-notes" fill value={notes} maxLength={1000} onChange={(e) => setNotes(e.currentTarget.value)} />
        </FormGroup>
      </Alert>
    </Page>
  );
}
