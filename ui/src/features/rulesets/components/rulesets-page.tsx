import { useState } from 'react';
import { Alert, Button, Callout, Card, H2, HTMLTable, NonIdealState, Tag } from '@blueprintjs/core';
import { BookIcon, ErrorIcon, HistoryIcon, LockIcon } from '@blueprintjs/icons';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { useRequiredUser } from '../../../lib/current-user';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useActivateVersion } from '../api/activate-version';
import type { RulesetVersionInfo } from '@fuelwright/shared';
import { useRulesets } from '../../../lib/rulesets';
import { when } from '../lib/format';
import { compareVersions, nextVersion } from '../lib/versions';
import { ProposalList } from './proposal-list';
import { ProposeForm } from './propose-form';
import '../rulesets.css';

/** Shop and admin: the published versions (one active), the proposals so far, proposing new weights; admins roll back. */
export function RulesetsPage() {
  const user = useRequiredUser();
  const admin = user.role === 'admin';
  const rulesets = useRulesets();
  const activate = useActivateVersion();
  const notify = useNotify();
  const [confirming, setConfirming] = useState<RulesetVersionInfo | null>(null);
  const phone = useMediaQuery('(max-width: 767px)');

  if (rulesets.isPending) return <PageSpinner label="Loading ruleset versions" />;
  if (rulesets.isError)
    return (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title="Ruleset versions could not be loaded"
        description={rulesets.error.message}
        action={<Button size="large" text="Try again" onClick={() => void rulesets.refetch()} />}
      />
    );

  const { active, versions } = rulesets.data;
  const newestFirst = [...versions].sort((a, b) => compareVersions(b.version, a.version));
  const published = versions.map((v) => v.version);
  const rollBack = confirming !== null && compareVersions(confirming.version, active) < 0;
  const activateButton = (v: RulesetVersionInfo) => (
    <Button
      className="fw-touch"
      variant="outlined"
      icon={<HistoryIcon />}
      text={compareVersions(v.version, active) < 0 ? `Roll back to ${v.version}` : `Activate ${v.version}`}
      onClick={() => setConfirming(v)}
    />
  );

  return (
    <Page
      title={
        <>
          <BookIcon size={26} className="fw-rs-title-icon" /> Rulesets
        </>
      }
      lead="Versions of the knowledge base and its weights. New cases are ranked with the active version; every case keeps the version it was opened with."
    >
      <Card className="fw-rs-panel" role="region" aria-labelledby="rs-versions">
        <H2 id="rs-versions" className="fw-rs-panel-title">
          Published versions
        </H2>
        <div className="fw-rs-scroll">
          <HTMLTable striped className="fw-rs-table">
            <thead>
              <tr>
                <th scope="col">Version</th>
                <th scope="col">Notes</th>
                <th scope="col" className="fw-hide-on-phone">
                  Published
                </th>
                {admin && !phone && (
                  <th scope="col" className="fw-rs-action-col">
                    <span className="fw-visually-hidden">Actions</span>
                  </th>
                )}
              </tr>
            </thead>
            <tbody>
              {newestFirst.map((v) => (
                <tr key={v.version} aria-current={v.active ? 'true' : undefined}>
                  <td>
                    <span className="fw-nowrap">
                      <strong>{v.version}</strong>{' '}
                      {v.active && (
                        <Tag round intent="success">
                          Active
                        </Tag>
                      )}
                    </span>
                    <div className="fw-muted fw-small">
                      {v.causes} causes, {v.rules} rules
                    </div>
                    {admin && phone && !v.active && <div className="fw-rs-phone-action">{activateButton(v)}</div>}
                  </td>
                  <td className="fw-break-word">
                    {v.notes || <span className="fw-muted">No notes</span>}
                    {v.parentVersion && <div className="fw-muted fw-small">Re-fitted from {v.parentVersion}</div>}
                    <div className="fw-muted fw-small fw-rs-phone-only">{when(v.publishedAt)}</div>
                  </td>
                  <td className="fw-hide-on-phone fw-nowrap">{when(v.publishedAt)}</td>
                  {admin && !phone && <td className="fw-nowrap">{!v.active && activateButton(v)}</td>}
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      </Card>

      <ProposalList active={active} />

      <Card className="fw-rs-panel" role="region" aria-labelledby="rs-propose">
        <H2 id="rs-propose" className="fw-rs-panel-title">
          Propose new weights
        </H2>
        <p className="fw-muted fw-rs-lead">
          Re-fits each cause’s prior and each rule’s likelihood ratio from the logged outcomes, starting from the active version’s values
          ({active}), and tests the result on outcomes held out of the fit. Nothing changes until an admin publishes it.
        </p>
        {!admin && (
          <Callout intent="primary" icon={<LockIcon size={20} />} compact>
            Only an admin can publish a proposal. Send them the proposal’s address once it is ready.
          </Callout>
        )}
        <ProposeForm suggestedVersion={nextVersion(published)} published={published} />
      </Card>

      <Alert
        isOpen={confirming !== null}
        icon={<HistoryIcon size={32} />}
        intent="warning"
        confirmButtonText={confirming ? (rollBack ? `Roll back to ${confirming.version}` : `Activate ${confirming.version}`) : 'Activate'}
        cancelButtonText="Cancel"
        loading={activate.isPending}
        onCancel={() => setConfirming(null)}
        onConfirm={() => {
          if (!confirming) return;
          const version = confirming.version;
          activate.mutate(version, {
            onSuccess: (r) => {
              notify.success(`Version ${r.active} is active. New cases are ranked with it.`);
              setConfirming(null);
            },
            onError: (e) => {
              notify.error(`Version ${version} not activated: ${e.message}`);
              setConfirming(null);
            },
          });
        }}
      >
        <p>
          {rollBack ? 'Roll back' : 'Switch'} from version <strong>{active}</strong> to <strong>{confirming?.version}</strong>?
        </p>
        <p>New cases will be ranked with {confirming?.version}. Cases already opened keep the version they were ranked with, and no version is deleted: you can switch back at any time.</p>
      </Alert>
    </Page>
  );
}
