import { useState } from 'react';
import { AnchorButton, Button, Card, NonIdealState } from '@blueprintjs/core';
import { DownloadIcon, EditIcon, EndorsedIcon, ErrorIcon } from '@blueprintjs/icons';
import { generatePath, Link, useSearchParams } from 'react-router-dom';
import type { OutcomeDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { PeriodFilter } from '../../../components/period-filter';
import { useNotify } from '../../../components/toaster';
import { API_BASE } from '../../../lib/api-client';
import { useRequiredUser } from '../../../lib/current-user';
import { useCatalog } from '../../../lib/catalog';
import { useOutcomes } from '../api/get-outcomes';
import { useRulesets } from '../../../lib/rulesets';
import { labelsFrom, type Labels } from '../lib/labels';
import { periodFromSearch, periodQueryString, type PeriodFilter as Filter } from '../../../lib/period';
import { OutcomeEntry } from './outcome-entry';
import { OutcomeForm } from './outcome-form';
import '../outcomes.css';

const PAGE = 50;

function Where({ o }: { o: OutcomeDto }) {
  if (o.workOrderId) return <Link to={generatePath(paths.workOrder, { workOrderId: o.workOrderId })}>Work order</Link>;
  if (o.caseId) return <Link to={generatePath(paths.case, { caseId: o.caseId })}>Case</Link>;
  return null;
}

function Row({ o, labels, canCorrect }: { o: OutcomeDto; labels: Labels; canCorrect: boolean }) {
  const [correcting, setCorrecting] = useState(false);
  const catalog = useCatalog();
  const notify = useNotify();
  const target = o.workOrderId ? { workOrderId: o.workOrderId } : o.caseId ? { caseId: o.caseId } : null;
  return (
    <li>
      <Card className="fw-oc-card">
        {correcting && target && catalog.data ? (
          <OutcomeForm
            idPrefix={`correct-${o.id.slice(0, 8)}`}
            target={target}
            catalog={catalog.data}
            supersedes={o}
            onLogged={() => {
              setCorrecting(false);
              notify.success('Correction saved. The earlier entry no longer counts.');
            }}
            onCancel={() => setCorrecting(false)}
          />
        ) : (
          <OutcomeEntry
            o={o}
            labels={labels}
            actions={
              <span className="fw-oc-tags">
                {/* The work order and the shared case are the shop's to open. */}
                {canCorrect && <Where o={o} />}
                {canCorrect && o.current && target && (
                  <Button className="fw-touch" variant="outlined" icon={<EditIcon />} text="Correct this entry" onClick={() => setCorrecting(true)} />
                )}
              </span>
            }
          />
        )}
      </Card>
    </li>
  );
}

/** Shop: its own outcome log; admin: everyone's. Newest first; the CSV export holds them all. */
export function OutcomesPage() {
  const user = useRequiredUser();
  const [params, setParams] = useSearchParams();
  const filter = periodFromSearch(params);
  const outcomes = useOutcomes(filter);
  const versions = useRulesets();
  const catalog = useCatalog();
  const labels = labelsFrom(catalog.data);
  const [shown, setShown] = useState(PAGE);
  const setFilter = (next: Filter) => {
    setShown(PAGE);
    setParams(periodQueryString(next), { replace: true });
  };
  const csv = `${API_BASE}/outcomes.csv${periodQueryString(filter)}`;

  let body;
  if (outcomes.isPending) body = <PageSpinner label="Loading outcomes" />;
  else if (outcomes.isError)
    body = (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title="Outcomes could not be loaded"
        description={outcomes.error.message}
        action={<Button size="large" text="Try again" onClick={() => void outcomes.refetch()} />}
      />
    );
  else if (outcomes.data.outcomes.length === 0)
    body = (
      <NonIdealState
        icon={<EndorsedIcon size={48} />}
        title={filter.from || filter.to || filter.version ? 'No outcomes in this period' : 'No outcomes logged yet'}
        description={user.role === 'shop' ? 'Log one from a work order or a shared case.' : 'Shops and racers log outcomes on work orders and cases.'}
      />
    );
  else {
    // Newest first whatever order the server sends them in.
    const list = [...outcomes.data.outcomes].sort((a, b) => b.at.localeCompare(a.at));
    const filtered = Boolean(filter.from || filter.to || filter.version);
    body = (
      <>
        <p className="fw-muted fw-result-count" role="status">
          {outcomes.data.total.toLocaleString()} current {outcomes.data.total === 1 ? 'entry' : 'entries'}
          {filtered ? ' in the period' : ''}
          {list.length < outcomes.data.total || list.length > shown
            ? `; the newest ${Math.min(shown, list.length)} shown here (download the CSV for all)`
            : ''}
          .
        </p>
        <ul className="fw-oc-list" aria-label="Outcomes">
          {list.slice(0, shown).map((o) => (
            <Row key={o.id} o={o} labels={labels} canCorrect={user.role === 'shop'} />
          ))}
        </ul>
        {list.length > shown && <Button className="fw-touch" size="large" variant="outlined" text={`Show ${Math.min(PAGE, list.length - shown)} more`} onClick={() => setShown((n) => n + PAGE)} />}
      </>
    );
  }

  return (
    <Page
      title="Outcomes"
      lead={user.role === 'shop' ? 'What you found on each kart and what fixed it. Entries are never changed: a correction is a new entry.' : 'What shops and racers found and what fixed it, newest first.'}
      actions={<AnchorButton className="fw-touch" size="large" variant="outlined" icon={<DownloadIcon />} href={csv} download text="Download CSV" />}
    >
      <PeriodFilter value={filter} onChange={setFilter} versions={versions.data?.versions ?? []} idPrefix="outcomes" />
      {body}
    </Page>
  );
}
