import { useState } from 'react';
import { Button, Callout, Card, H2, Spinner } from '@blueprintjs/core';
import { ClipboardIcon, EndorsedIcon } from '@blueprintjs/icons';
import type { CaseDto, OutcomeDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { useNotify } from '../../../components/toaster';
import { useCurrentUser } from '../../../lib/current-user';
import { useCatalog } from '../api/get-catalog';
import { useOutcomes } from '../api/get-outcomes';
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
 * "Log what really fixed it" on a case: for its owner once the case is resolved (or stopped), and
 * for a shop the case is shared with. A shop sees the entries it logged on the case and corrects
 * them; a racer sees the entries logged here since the page opened.
 */
export function LogOutcomePanel({ c }: LogOutcomePanelProps) {
  const viewer = useCurrentUser();
  const owner = viewer?.id === c.ownerId;
  const shop = viewer?.role === 'shop' && !owner;
  const shown = (owner && (c.state === 'resolved' || c.state === 'stopped')) || shop;
  const catalog = useCatalog();
  // A shop's own entries come from the outcome list (its newest 200); a racer has no list to read.
  const list = useOutcomes({}, shown && shop);
  const [mine, setMine] = useState<OutcomeDto[]>([]);
  const [open, setOpen] = useState(false);
  const notify = useNotify();
  if (!shown || !viewer) return null;

  const labels = labelsFrom(catalog.data);
  const fromList = shop ? (list.data?.outcomes ?? []).filter((o) => o.caseId === c.id) : [];
  const known = new Set(fromList.map((o) => o.id));
  const entries = [...fromList, ...mine.filter((o) => !known.has(o.id))].map((o) =>
    mine.some((m) => m.supersedesId === o.id) ? { ...o, current: false } : o,
  );
  const logged = (o: OutcomeDto) => {
    setMine((list) => [o, ...list]);
    setOpen(false);
    notify.success(o.supersedesId ? 'Correction saved. The earlier entry no longer counts.' : 'Outcome logged. Thank you: it helps the ranking learn.');
  };
  const initial = owner && c.resolution ? { causes: [c.resolution.causeId], fix: c.resolution.fix } : undefined;
  const hasCurrent = entries.some((o) => o.current);

  return (
    <Card className="fw-oc-panel" role="region" aria-labelledby="case-log-outcome">
      <H2 id="case-log-outcome" className="fw-oc-panel-title">
        <EndorsedIcon size={20} className="fw-oc-title-icon" /> Log what really fixed it
      </H2>
      <p className="fw-muted fw-small fw-oc-panel-lead">
        {shop
          ? 'What you found on this kart and what fixed it. Outcomes teach the ranking which causes to put first.'
          : 'Once you are sure what fixed it, log it here (a shop may log it for you). Outcomes teach the ranking which causes to put first.'}
      </p>
      {shop && list.isPending && <Spinner size={20} aria-label="Loading your entries" />}
      {shop && list.isError && (
        <Callout intent="warning" compact>
          Your earlier entries could not be loaded: {list.error.message}
        </Callout>
      )}
      {entries.length > 0 && <OutcomeHistory outcomes={entries} labels={labels} catalog={catalog.data} target={{ caseId: c.id }} canCorrect onLogged={logged} />}
      {catalog.isError && (
        <Callout intent="danger" compact>
          The list of causes could not be loaded: {catalog.error.message}
        </Callout>
      )}
      {open && catalog.data ? (
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
          {!hasCurrent && (
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
      )}
    </Card>
  );
}
