import { Button, Card, NonIdealState, Tag } from '@blueprintjs/core';
import { ClipboardIcon, ErrorIcon, FolderSharedIcon, PlusIcon } from '@blueprintjs/icons';
import { generatePath, Link } from 'react-router-dom';
import type { WorkOrderDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useCatalog } from '../../../lib/catalog';
import { useWorkOrders } from '../api/get-work-orders';
import { formatDate, labelsFrom, type Labels } from '../lib/labels';
import '../outcomes.css';

function WorkOrderCard({ w, labels }: { w: WorkOrderDto; labels: Labels }) {
  const href = generatePath(paths.workOrder, { workOrderId: w.id });
  return (
    <li>
      <Card className="fw-oc-card">
        <div className="fw-oc-card-head">
          <Link to={href} className="fw-oc-card-title fw-break-word">
            {w.customerName}
            {w.kartDescription && <span className="fw-muted"> · {w.kartDescription}</span>}
          </Link>
          <span className="fw-oc-tags">
            <Tag round intent={w.status === 'done' ? 'success' : 'warning'} minimal={w.status === 'done'}>
              {w.status === 'done' ? 'Done' : 'Open'}
            </Tag>
            {w.caseId && (
              <Tag round minimal icon={<FolderSharedIcon size={12} />}>
                Shared case
              </Tag>
            )}
          </span>
        </div>
        <div className="fw-break-word">{w.symptoms.map((s) => labels.symptom(s.id)).join(' · ') || <span className="fw-muted">No symptoms given</span>}</div>
        <div className="fw-small fw-muted">
          In {formatDate(w.createdAt)} · {w.outcomes === 0 ? 'no outcome logged yet' : w.outcomes === 1 ? '1 outcome logged' : `${w.outcomes} outcomes logged`}
        </div>
        <div>
          <LinkButton className="fw-touch" variant="outlined" to={href} text={w.status === 'done' ? 'Open' : 'Open and log the outcome'} />
        </div>
      </Card>
    </li>
  );
}

/** Shop: customers' karts in for work, open ones first, newest first. */
export function WorkOrdersPage() {
  const orders = useWorkOrders();
  const catalog = useCatalog();
  const labels = labelsFrom(catalog.data);
  const add = <LinkButton className="fw-touch" size="large" intent="primary" icon={<PlusIcon />} to={paths.newWorkOrder} text="New work order" />;

  let body;
  if (orders.isPending) body = <PageSpinner label="Loading work orders" />;
  else if (orders.isError)
    body = (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title="Work orders could not be loaded"
        description={orders.error.message}
        action={<Button size="large" text="Try again" onClick={() => void orders.refetch()} />}
      />
    );
  else if (orders.data.length === 0)
    body = (
      <NonIdealState
        icon={<ClipboardIcon size={48} />}
        title="No work orders yet"
        description="Open one for a walk-in customer, or for a case a racer shared with you."
        action={add}
      />
    );
  else {
    const sorted = [...orders.data].sort((a, b) => Number(a.status === 'done') - Number(b.status === 'done') || b.createdAt.localeCompare(a.createdAt));
    const open = sorted.filter((w) => w.status === 'open').length;
    body = (
      <>
        <p className="fw-muted fw-result-count">
          {open === 0 ? 'None open' : open === 1 ? '1 open' : `${open} open`} · {sorted.length} in all
        </p>
        <ul className="fw-oc-list" aria-label="Work orders">
          {sorted.map((w) => (
            <WorkOrderCard key={w.id} w={w} labels={labels} />
          ))}
        </ul>
      </>
    );
  }

  return (
    <Page title="Work orders" lead="Customers’ karts in for work. Log what really fixed each one: it teaches the ranking." actions={add}>
      {body}
    </Page>
  );
}
