import { useState } from 'react';
import { Button, Card, H2, HTMLTable, NonIdealState, Spinner } from '@blueprintjs/core';
import { AddIcon, ChevronRightIcon, DriveTimeIcon, ErrorIcon } from '@blueprintjs/icons';
import { generatePath, Link, useNavigate } from 'react-router-dom';
import { CARBURETTOR_KIND_LABELS, DRIVE_LABELS, type KartDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { useNotify } from '../../../components/toaster';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useCreateKart } from '../api/create-kart';
import { useKarts } from '../api/get-karts';
import { EMPTY_KART_FORM } from '../lib/kart-form';
import { PHONE_QUERY } from '../lib/phone';
import { KartForm } from './kart-form';
import '../karts.css';

const kartPath = (kart: KartDto) => generatePath(paths.kart, { kartId: kart.id });

function AddKartCard({ onClose, closable }: { onClose: () => void; closable: boolean }) {
  const create = useCreateKart();
  const navigate = useNavigate();
  const notify = useNotify();
  return (
    <Card className="fw-form-card" aria-labelledby="add-kart-title">
      <H2 id="add-kart-title" className="fw-section-title">
        Add a kart
      </H2>
      <KartForm
        idPrefix="add-kart"
        initial={EMPTY_KART_FORM}
        submitText="Add kart"
        submitIcon={<AddIcon />}
        pending={create.isPending}
        error={create.error}
        onCancel={closable ? onClose : undefined}
        onSubmit={(input) =>
          create.mutate(input, {
            onSuccess: (kart) => {
              notify.success(`${kart.name} added. Record its setup next.`);
              void navigate(kartPath(kart));
            },
          })
        }
      />
    </Card>
  );
}

function KartCards({ karts }: { karts: KartDto[] }) {
  return (
    <ul className="fw-card-list" aria-label="Your karts">
      {karts.map((kart) => (
        <li key={kart.id}>
          <Card className="fw-kart-card">
            <Link className="fw-kart-card-link" to={kartPath(kart)}>
              <span className="fw-kart-card-text">
                <strong className="fw-kart-card-name fw-break-word">{kart.name}</strong>
                <span className="fw-muted">
                  {kart.displacementCc} cc · {DRIVE_LABELS[kart.drive]}
                </span>
                <span className="fw-muted">{CARBURETTOR_KIND_LABELS[kart.carburettorKind]}</span>
              </span>
              <ChevronRightIcon size={20} className="fw-muted" />
            </Link>
          </Card>
        </li>
      ))}
    </ul>
  );
}

function KartTable({ karts }: { karts: KartDto[] }) {
  return (
    <HTMLTable className="fw-data-table" striped aria-label="Your karts">
      <thead>
        <tr>
          <th scope="col">Name</th>
          <th scope="col">Engine</th>
          <th scope="col">Drive</th>
          <th scope="col">Carburettor</th>
          <th scope="col">Notes</th>
        </tr>
      </thead>
      <tbody>
        {karts.map((kart) => (
          <tr key={kart.id}>
            <td>
              <Link className="fw-strong-link" to={kartPath(kart)}>
                {kart.name}
              </Link>
            </td>
            <td>{kart.displacementCc} cc two-stroke</td>
            <td>{DRIVE_LABELS[kart.drive]}</td>
            <td>{CARBURETTOR_KIND_LABELS[kart.carburettorKind]}</td>
            <td className="fw-notes-cell">
              <span className="fw-muted fw-clamp-2">{kart.notes || '—'}</span>
            </td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

/** The racer's karts (cards on a phone, a table on a wider screen) and the form to add one. */
export function KartsPage() {
  const karts = useKarts();
  const phone = useMediaQuery(PHONE_QUERY);
  const [adding, setAdding] = useState(false);
  const list = karts.data ?? [];
  const showForm = adding || (karts.isSuccess && list.length === 0);

  return (
    <Page
      title={
        <>
          <DriveTimeIcon size={28} className="fw-title-icon" /> My karts
        </>
      }
      lead="Each kart with its engine and carburettor, and the setups you ran it with."
      actions={
        !showForm && karts.isSuccess ? (
          <Button className="fw-touch" size="large" intent="primary" icon={<AddIcon />} text="Add a kart" onClick={() => setAdding(true)} />
        ) : undefined
      }
    >
      {showForm && <AddKartCard closable={list.length > 0} onClose={() => setAdding(false)} />}
      {karts.isPending ? (
        <Spinner aria-label="Loading karts" />
      ) : karts.isError ? (
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="Karts could not be loaded"
          description={karts.error.message}
          action={<Button size="large" text="Try again" onClick={() => void karts.refetch()} />}
        />
      ) : list.length === 0 ? (
        <p className="fw-muted">No karts yet. Add the first one above: it takes a minute.</p>
      ) : phone ? (
        <KartCards karts={list} />
      ) : (
        <KartTable karts={list} />
      )}
      {karts.isSuccess && list.length > 0 && (
        <p className="fw-muted">
          Something wrong with how one runs? Open the kart and press “Diagnose this kart”, or see your{' '}
          <Link to={paths.cases}>cases</Link>.
        </p>
      )}
      {karts.isSuccess && list.length === 0 && (
        <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.quickDiagnosis} text="Or run a quick diagnosis without a kart" />
      )}
    </Page>
  );
}
