import { useState } from 'react';
import { Button, Callout, Card, H2, Spinner } from '@blueprintjs/core';
import { ClipboardIcon, EndorsedIcon } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import type { CaseDto, CaseOutcomeDto, OutcomeDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { useNotify } from '../../../components/toaster';
import { useCurrentUser } from '../../../lib/current-user';
import { caseOutcomesQueryKey, useCaseOutcomes } from '../api/get-case-outcomes';
import { useCatalog } from '../../../lib/catalog';
import { labelsFrom } from '../lib/labels';
import { OutcomeForm } from './outcome-form';
import { OutcomeHistory } from './outcome-history';
import '../outcomes.css';

/** What the case page hands to this panel. */
export interface LogOutcomePanelProps {
  c: CaseDto;
}

const LIKELY = 5;

/**
 * "Log what really fixed it" on a case. Everyone who may read the case sees what was logged on it
 * (the owner's entries and a shop's, each current one with the entries it corrected underneath).
 * The owner logs once the case is resolved (or stopped), a shop the case is shared with at any
 * time; each corrects their own entries. A coach only reads, and sees the panel once there is
 * something to read.
 */
export function LogOutcomePanel({ c }: LogOutcomePanelProps) {
  const viewer = useCurrentUser();
  const owner = viewer?.id === c.ownerId;
  const shop = viewer?.role === 'shop' && !owner;
  const canLog = (owner && (c.state === 'resolved' || c.state === 'stopped')) || shop;
  const entries = useCaseOutcomes(c.id, viewer !== null);
  const catalog = useCatalog();
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(false);
  const notify = useNotify();
  const list = entries.data ?? [];
  if (!viewer || (!canLog && list.length === 0)) return null;

  const readOnly = !owner && !shop;
  const labels = labelsFrom(catalog.data);
  const logged = (o: OutcomeDto) => {
    // Logging refetches the list (often before this runs); in case it has not, the entry goes in here.
    queryClient.setQueryData<CaseOutcomeDto[]>(caseOutcomesQueryKey(c.id), (old = []) => {
      const marked = old.map((x) => (x.id === o.supersedesId ? { ...x, current: false } : x));
      return marked.some((x) => x.id === o.id) ? marked : [{ ...o, yours: true }, ...marked];
    });
    setOpen(false);
    notify.success(o.supersedesId ? 'Correction saved. The earlier entry no longer counts.' : 'Outcome logged. Thank you: it helps the ranking learn.');
  };
  const initial = owner && c.resolution ? { causes: [c.resolution.causeId], fix: c.resolution.fix } : undefined;
  // One current entry each: after that, the logger corrects theirs rather than adding another.
  const hasOwnCurrent = list.some((o) => o.yours && o.current);

  return (
    <Card className="fw-oc-panel" role="region" aria-labelledby="case-log-outcome">
      <H2 id="case-log-outcome" className="fw-oc-panel-title">
        <EndorsedIcon size={20} className="fw-oc-title-icon" /> {canLog ? 'Log what really fixed it' : 'What really fixed it'}
      </H2>
      <p className="fw-muted fw-small fw-oc-panel-lead">
        {shop
          ? 'What you found on this kart and what fixed it. Outcomes teach the ranking which causes to put first.'
          : readOnly
            ? 'What the racer or their shop logged as the real cause and fix.'
            : canLog
              ? 'Once you are sure what fixed it, log it here (a shop may log it for you). Outcomes teach the ranking which causes to put first.'
              : 'What was logged on this case so far. You can log your own once the case is resolved.'}
      </p>
      {entries.isPending && <Spinner size={20} aria-label="Loading what was logged" />}
      {entries.isError && (
        <Callout intent="warning" compact>
          What was logged on this case could not be loaded: {entries.error.message}{' '}
          <Button variant="minimal" text="Try again" onClick={() => void entries.refetch()} />
        </Callout>
      )}
      {list.length > 0 && (
        <OutcomeHistory
          outcomes={list}
          labels={labels}
          catalog={catalog.data}
          target={{ caseId: c.id }}
          canCorrect={(o) => !readOnly && o.yours}
          onLogged={logged}
        />
      )}
      {catalog.isError && (
        <Callout intent="danger" compact>
          The list of causes could not be loaded: {catalog.error.message}
        </Callout>
      )}
      {canLog &&
        (open && catalog.data ? (
          <OutcomeForm
            idPrefix="case-outcome"
            target={{ caseId: c.id }}
            catalog={catalog.data}
            likely={c.rank.causes.slice(0, LIKELY).map((cause) => cause.id)}
            initial={initial}
            onLogged={logged}
            onCancel={() => setOpen(false)}
          />
        ) : (
          <div className="fw-oc-actions">
            {!hasOwnCurrent && !entries.isPending && (
              <Button
                className="fw-touch"
                size="large"
                intent="primary"
                icon={<EndorsedIcon />}
                text="Log the outcome"
                loading={catalog.isPending}
                onClick={() => setOpen(true)}
              />
            )}
            {shop && (
              <LinkButton
                className="fw-touch"
                size="large"
                variant="outlined"
                icon={<ClipboardIcon />}
                to={`${paths.newWorkOrder}?caseId=${encodeURIComponent(c.id)}`}
                text="Open a work order for it"
              />
            )}
          </div>
        ))}
    </Card>
  );
}
