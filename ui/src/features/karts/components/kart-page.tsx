import { useEffect, useRef, useState } from 'react';
import { Alert, Button, Card, H2, NonIdealState, Spinner } from '@blueprintjs/core';
import {
  AddIcon,
  DiagnosisIcon,
  DriveTimeIcon,
  EditIcon,
  ErrorIcon,
  FilterIcon,
  FolderOpenIcon,
  TrashIcon,
} from '@blueprintjs/icons';
import { generatePath, Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { CARBURETTOR_KIND_LABELS, DRIVE_LABELS, type KartDto } from '@fuelwright/shared';
import { paths, SETUP_PARAM } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useNotify } from '../../../components/toaster';
import { isApiError } from '../../../lib/api-client';
import { useCurrentUser } from '../../../lib/current-user';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useDeleteKart } from '../api/delete-kart';
import { useKart } from '../api/get-kart';
import { useSetups } from '../api/get-setups';
import { useUpdateKart } from '../api/update-kart';
import { kartFormFrom } from '../lib/kart-form';
import { PHONE_QUERY } from '../lib/phone';
import { KartForm } from './kart-form';
import { SetupForm } from './setup-form';
import { SetupCards, SetupsTable } from './setups-table';
import '../karts.css';

function KartFacts({ kart }: { kart: KartDto }) {
  return (
    <dl className="fw-facts">
      <div>
        <dt>Engine</dt>
        <dd>{kart.displacementCc} cc two-stroke</dd>
      </div>
      <div>
        <dt>Drive</dt>
        <dd>{DRIVE_LABELS[kart.drive]}</dd>
      </div>
      <div>
        <dt>Carburettor</dt>
        <dd>{CARBURETTOR_KIND_LABELS[kart.carburettorKind]}</dd>
      </div>
      <div className="fw-facts-wide">
        <dt>Notes</dt>
        <dd className="fw-break-word fw-pre-line">{kart.notes || <span className="fw-muted">None</span>}</dd>
      </div>
    </dl>
  );
}

function EditKart({ kart, onDone }: { kart: KartDto; onDone: () => void }) {
  const update = useUpdateKart(kart.id);
  const notify = useNotify();
  return (
    <KartForm
      idPrefix="edit-kart"
      initial={kartFormFrom(kart)}
      submitText="Save kart"
      pending={update.isPending}
      error={update.error}
      onCancel={onDone}
      onSubmit={(input) =>
        update.mutate(input, {
          onSuccess: (saved) => {
            notify.success(`${saved.name} saved.`);
            onDone();
          },
        })
      }
    />
  );
}

function DeleteKartAlert({ kart, setupCount, isOpen, onClose }: { kart: KartDto; setupCount: number | undefined; isOpen: boolean; onClose: () => void }) {
  const remove = useDeleteKart();
  const navigate = useNavigate();
  const notify = useNotify();
  const setups =
    setupCount === undefined ? 'its setups' : setupCount === 1 ? 'its 1 setup' : `its ${setupCount} setups`;
  return (
    <Alert
      isOpen={isOpen}
      intent="danger"
      icon={<TrashIcon size={40} />}
      confirmButtonText="Delete kart"
      cancelButtonText="Keep it"
      canEscapeKeyCancel
      loading={remove.isPending}
      onCancel={onClose}
      onConfirm={() =>
        remove.mutate(kart.id, {
          onSuccess: () => {
            notify.success(`${kart.name} deleted.`);
            onClose();
            void navigate(paths.karts, { replace: true });
          },
          onError: (error) => notify.error(`${kart.name} was not deleted: ${error.message}`),
        })
      }
    >
      <p>
        <strong>Delete {kart.name}?</strong>
      </p>
      <p>
        {setups[0].toUpperCase() + setups.slice(1)}, its jetting log and its cases are deleted with it. This cannot be
        undone.
      </p>
    </Alert>
  );
}

/**
 * Once the setups are on screen, scrolls to the one a link named (`?setup=<id>`, from the jetting
 * log), or to the list when the address ends in `#setups`. Only once per setup named.
 */
function useScrollToSetup(selectedId: string | undefined, loaded: boolean) {
  const done = useRef<string | null>(null);
  useEffect(() => {
    if (!loaded) return;
    const key = selectedId ?? '#';
    if (done.current === key) return;
    const row = selectedId ? [...document.querySelectorAll('[data-setup-id]')].find((el) => el.getAttribute('data-setup-id') === selectedId) : null;
    const target = row ?? (selectedId || window.location.hash === '#setups' ? document.getElementById('setups') : null);
    if (!target) return;
    done.current = key;
    target.scrollIntoView?.({ block: row ? 'center' : 'start' });
  }, [selectedId, loaded]);
}

/** One kart: its facts (edit, delete), the way into a diagnosis, and its setups. */
export function KartPage() {
  const { kartId = '' } = useParams();
  const [params] = useSearchParams();
  const selectedSetupId = params.get(SETUP_PARAM) ?? undefined;
  const viewer = useCurrentUser();
  const kart = useKart(kartId);
  const setups = useSetups(kartId);
  const phone = useMediaQuery(PHONE_QUERY);
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [recording, setRecording] = useState(false);
  useScrollToSetup(selectedSetupId, kart.isSuccess && setups.isSuccess);

  if (kart.isPending) return <PageSpinner label="Loading the kart" />;
  if (kart.isError) {
    const missing = isApiError(kart.error) && kart.error.status === 404;
    return (
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        title={missing ? 'Kart not found' : 'The kart could not be loaded'}
        description={missing ? 'It may have been deleted, or it is not one of yours.' : kart.error.message}
        action={
          missing ? (
            <LinkButton className="fw-touch" size="large" to={paths.karts} text="Back to my karts" />
          ) : (
            <Button size="large" text="Try again" onClick={() => void kart.refetch()} />
          )
        }
      />
    );
  }

  const k = kart.data;
  // A coach or shop the kart is shared with reads it; only its owner changes it.
  const owner = viewer?.id === k.ownerId;
  const list = setups.data ?? [];
  const latest = list[0];
  const showForm = owner && (recording || (setups.isSuccess && list.length === 0));

  return (
    <Page
      title={
        <>
          <DriveTimeIcon size={28} className="fw-title-icon" /> <span className="fw-break-word">{k.name}</span>
        </>
      }
      lead={`${k.displacementCc} cc two-stroke · ${DRIVE_LABELS[k.drive]} · ${CARBURETTOR_KIND_LABELS[k.carburettorKind]}`}
      actions={
        owner ? (
          <LinkButton
            className="fw-touch"
            size="large"
            intent="primary"
            icon={<DiagnosisIcon />}
            to={`${paths.diagnoseKart}?kartId=${encodeURIComponent(k.id)}`}
            text="Diagnose this kart"
          />
        ) : undefined
      }
    >
      {owner && (
        <p className="fw-back-link">
          <Link to={paths.karts}>← My karts</Link>
        </p>
      )}
      <Card className="fw-form-card" aria-labelledby="kart-about-title">
        <div className="fw-section-head">
          <H2 id="kart-about-title" className="fw-section-title">
            {editing ? 'Edit kart' : 'About this kart'}
          </H2>
          {!editing && owner && (
            <div className="fw-section-actions">
              <Button className="fw-touch" size="large" icon={<EditIcon />} text="Edit" onClick={() => setEditing(true)} />
              <Button
                className="fw-touch"
                size="large"
                intent="danger"
                variant="outlined"
                icon={<TrashIcon />}
                text="Delete"
                onClick={() => setDeleting(true)}
              />
            </div>
          )}
        </div>
        {editing ? <EditKart kart={k} onDone={() => setEditing(false)} /> : <KartFacts kart={k} />}
        <div className="fw-link-row">
          {owner && (
            <LinkButton
              className="fw-touch"
              variant="minimal"
              icon={<FolderOpenIcon />}
              to={`${paths.cases}?kartId=${encodeURIComponent(k.id)}`}
              text="Cases on this kart"
            />
          )}
          <LinkButton
            className="fw-touch"
            variant="minimal"
            icon={<FilterIcon />}
            to={generatePath(paths.kartJetting, { kartId: k.id })}
            text="Jetting log"
          />
        </div>
      </Card>
      <DeleteKartAlert kart={k} setupCount={setups.data?.length} isOpen={deleting} onClose={() => setDeleting(false)} />

      <section className="fw-section" id="setups" aria-labelledby="setups-title">
        <div className="fw-section-head">
          <H2 id="setups-title" className="fw-section-title">
            Setups
          </H2>
          {owner && !showForm && setups.isSuccess && (
            <Button className="fw-touch" size="large" intent="primary" icon={<AddIcon />} text="Record a setup" onClick={() => setRecording(true)} />
          )}
        </div>
        {showForm && (
          <Card className="fw-form-card">
            <SetupForm
              key={latest?.id ?? 'first'}
              kartId={k.id}
              carburettorKind={k.carburettorKind}
              latest={latest}
              onRecorded={() => setRecording(false)}
              onCancel={list.length > 0 ? () => setRecording(false) : undefined}
            />
          </Card>
        )}
        {setups.isPending ? (
          <Spinner aria-label="Loading setups" />
        ) : setups.isError ? (
          <NonIdealState
            icon={<ErrorIcon size={48} />}
            title="Setups could not be loaded"
            description={setups.error.message}
            action={<Button size="large" text="Try again" onClick={() => void setups.refetch()} />}
          />
        ) : list.length === 0 ? (
          !owner && <p className="fw-muted">No setups recorded yet.</p>
        ) : (
          <>
            <p className="fw-muted fw-section-lead">Newest first. What changed against the setup before is highlighted.</p>
            {selectedSetupId && !list.some((s) => s.id === selectedSetupId) && (
              <p className="fw-muted" role="status">
                The setup the link points to is not among this kart’s setups any more.
              </p>
            )}
            {phone ? <SetupCards setups={list} selectedId={selectedSetupId} /> : <SetupsTable setups={list} selectedId={selectedSetupId} />}
          </>
        )}
      </section>
    </Page>
  );
}
