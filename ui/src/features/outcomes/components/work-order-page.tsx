import { Button, Callout, Card, H2, NonIdealState, Spinner, Tag } from '@blueprintjs/core';
import { ClipboardIcon, ErrorIcon } from '@blueprintjs/icons';
import { generatePath, Link, useParams } from 'react-router-dom';
import { SETUP_FIELDS, type OutcomeDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { formatSetupValue, SETUP_FIELD_LABELS } from '../../../lib/setup-fields';
import { useCatalog } from '../../../lib/catalog';
import { useOutcomes } from '../api/get-outcomes';
import { useWorkOrders } from '../api/get-work-orders';
import { useRankSymptoms } from '../api/rank-symptoms';
import { formatDateTime, labelsFrom } from '../lib/labels';
import { OutcomeForm } from './outcome-form';
import { OutcomeHistory } from './outcome-history';
import { cautionsFor, SymptomCautions } from './symptom-cautions';
import '../outcomes.css';

/** Shop: one work order, its outcome (or the form to log it) and any corrections. */
export function WorkOrderPage() {
  const { workOrderId = '' } = useParams();
  const orders = useWorkOrders();
  const catalog = useCatalog();
  const outcomes = useOutcomes();
  const w0 = orders.data?.find((x) => x.id === workOrderId);
  // The kart's setup counts as much as its symptoms (vent lines off, old foam): rank with both.
  const ranking = useRankSymptoms({ symptoms: w0?.symptoms ?? [], setup: w0?.setup ?? {} }, w0 !== undefined);
  const notify = useNotify();
  const labels = labelsFrom(catalog.data);

  if (orders.isPending) return <PageSpinner label="Loading the work order" />;
  const w = orders.data?.find((x) => x.id === workOrderId);
  if (!w) {
    return (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title={orders.isError ? 'The work order could not be loaded' : 'Work order not found'}
        description={orders.isError ? orders.error.message : 'It may belong to another shop.'}
        action={<LinkButton className="fw-touch" size="large" to={paths.workOrders} text="Back to work orders" />}
      />
    );
  }

  const setup = SETUP_FIELDS.flatMap((field) => {
    const value = formatSetupValue(field, w.setup ?? {});
    return value === null ? [] : [{ field, value }];
  });
  const entries = (outcomes.data?.outcomes ?? []).filter((o) => o.workOrderId === w.id);
  const hasCurrent = entries.some((o) => o.current);
  const logged = (o: OutcomeDto) =>
    notify.success(o.supersedesId ? 'Correction saved. The earlier entry no longer counts.' : 'Outcome logged. The work order is done.');

  return (
    <Page
      title={
        <>
          <ClipboardIcon size={26} className="fw-oc-title-icon" /> <span className="fw-break-word">{w.customerName}</span>
        </>
      }
      lead={
        <span className="fw-oc-tags">
          <Tag round intent={w.status === 'done' ? 'success' : 'warning'}>
            {w.status === 'done' ? 'Done' : 'Open'}
          </Tag>
          <span>In {formatDateTime(w.createdAt)}</span>
        </span>
      }
    >
      <p className="fw-back-link">
        <Link to={paths.workOrders}>← Work orders</Link>
      </p>
      <SymptomCautions cautions={cautionsFor(catalog.data, w.symptoms.map((s) => s.id))} />
      <Card className="fw-oc-panel" role="region" aria-labelledby="wo-facts">
        <H2 id="wo-facts" className="fw-oc-panel-title">
          The kart
        </H2>
        <dl className="fw-oc-facts">
          <dt>Kart</dt>
          <dd className="fw-break-word">{w.kartDescription || 'Not described'}</dd>
          <dt>Symptoms</dt>
          <dd>
            <ul className="fw-oc-symptom-list">
              {w.symptoms.map((s) => (
                <li key={s.id}>{labels.symptom(s.id)}</li>
              ))}
            </ul>
          </dd>
          <dt>Setup</dt>
          <dd>
            {setup.length === 0 ? (
              <span className="fw-muted">Not given</span>
            ) : (
              <ul className="fw-oc-symptom-list" aria-label="Setup">
                {setup.map(({ field, value }) => (
                  <li key={field}>
                    {SETUP_FIELD_LABELS[field]}: {value}
                  </li>
                ))}
              </ul>
            )}
          </dd>
          {w.caseId && (
            <>
              <dt>Case</dt>
              <dd>
                <Link to={generatePath(paths.case, { caseId: w.caseId })}>Open the shared case</Link>
              </dd>
            </>
          )}
          {w.notes && (
            <>
              <dt>Notes</dt>
              <dd className="fw-break-word">{w.notes}</dd>
            </>
          )}
        </dl>
      </Card>
      <Card className="fw-oc-panel" role="region" aria-labelledby="wo-outcome">
        <H2 id="wo-outcome" className="fw-oc-panel-title">
          {hasCurrent ? 'Outcome' : 'Log what really fixed it'}
        </H2>
        {outcomes.isPending && <Spinner size={24} aria-label="Loading outcomes" />}
        {outcomes.isError && (
          <Callout intent="danger">
            Outcomes could not be loaded: {outcomes.error.message}{' '}
            <Button variant="minimal" text="Try again" onClick={() => void outcomes.refetch()} />
          </Callout>
        )}
        {entries.length > 0 && (
          <OutcomeHistory outcomes={entries} labels={labels} catalog={catalog.data} target={{ workOrderId: w.id }} canCorrect onLogged={logged} />
        )}
        {catalog.isError && <Callout intent="danger">The list of causes could not be loaded: {catalog.error.message}</Callout>}
        {!hasCurrent && outcomes.isSuccess && catalog.data && ranking.fetchStatus === 'idle' && (
          // Shown once the ranking has answered (or failed), so the likely causes come first.
          <OutcomeForm
            idPrefix="wo-outcome"
            target={{ workOrderId: w.id }}
            catalog={catalog.data}
            likely={ranking.data?.causes.slice(0, 5).map((c) => c.id)}
            onLogged={logged}
          />
        )}
      </Card>
    </Page>
  );
}
