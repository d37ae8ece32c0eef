import { useState, type FormEvent } from 'react';
import { Button, Callout, Card, Checkbox, FormGroup, Radio, SegmentedControl, Spinner, TextArea } from '@blueprintjs/core';
import { generatePath, Link, useNavigate, useSearchParams } from 'react-router-dom';
import { type CarburettorKind, type CreateWorkOrderRequest } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { useCreateWorkOrder } from '../api/create-work-order';
import { useCatalog } from '../../../lib/catalog';
import { useSharedCases } from '../api/get-shared-cases';
import { formatDate, labelsFrom } from '../lib/labels';
import { SymptomCautions } from './symptom-cautions';
import '../outcomes.css';

type Source = 'walk-in' | 'case';
const KIND_OPTIONS: { value: CarburettorKind | ''; label: string }[] = [
  { value: 'pump-around', label: 'Pump-around' },
  { value: 'float-valve', label: 'Float-valve' },
  { value: '', label: 'Not known' },
];
const FIELDS = ['caseId', 'customerName', 'kartDescription', 'symptoms', 'notes', 'setup.carburettorKind'];

/** Shop: a new work order, for a walk-in (symptoms entered here) or for a case a racer shared. */
export function NewWorkOrderPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const [source, setSource] = useState<Source>(params.get('caseId') ? 'case' : 'walk-in');
  const [caseId, setCaseId] = useState(params.get('caseId') ?? '');
  const [customerName, setCustomerName] = useState('');
  const [kartDescription, setKartDescription] = useState('');
  const [kind, setKind] = useState<CarburettorKind | ''>('');
  const [symptoms, setSymptoms] = useState<string[]>([]);
  const [notes, setNotes] = useState('');
  const [local, setLocal] = useState<Record<string, string>>({});
  const catalog = useCatalog();
  const shared = useSharedCases(source === 'case');
  const create = useCreateWorkOrder();
  const server = formErrors(create.error, FIELDS);
  const errorsFor = (field: string) => (local[field] ? [local[field]] : server.field(field));
  const labels = labelsFrom(catalog.data);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const errors: Record<string, string> = {};
    let request: CreateWorkOrderRequest;
    if (source === 'case') {
      if (!caseId) errors.caseId = 'Pick the shared case the kart came in for.';
      request = { caseId, notes: notes.trim() || undefined };
    } else {
      if (!customerName.trim()) errors.customerName = 'Name the customer.';
      if (symptoms.length === 0) errors.symptoms = 'Tick what the customer noticed.';
      request = {
        customerName: customerName.trim(),
        kartDescription: kartDescription.trim() || undefined,
        symptoms,
        setup: kind ? { carburettorKind: kind } : undefined,
        notes: notes.trim() || undefined,
      };
    }
    setLocal(errors);
    if (Object.keys(errors).length > 0) return;
    create.mutate(request, { onSuccess: (w) => navigate(generatePath(paths.workOrder, { workOrderId: w.id })) });
  };

  return (
    <Page title="New work order" lead="A customer’s kart in for work." narrow>
      <p className="fw-back-link">
        <Link to={paths.workOrders}>← Work orders</Link>
      </p>
      <Card className="fw-form-card">
        <form className="fw-oc-form" onSubmit={submit} noValidate aria-label="New work order">
          {server.form && (
            <Callout intent="danger" role="alert" className="fw-form-error">
              {server.form}
            </Callout>
          )}
          <FormGroup label="The kart came in" labelFor="wo-source">
            <div id="wo-source">
              <SegmentedControl
                aria-label="The kart came in"
                size="large"
                fill
                options={[
                  { value: 'walk-in', label: 'Walk-in' },
                  { value: 'case', label: 'For a shared case' },
                ]}
                value={source}
                onValueChange={(v) => setSource(v as Source)}
              />
            </div>
          </FormGroup>

          {source === 'case' ? (
            <fieldset className="fw-oc-fieldset" aria-describedby={errorsFor('caseId').length ? 'wo-case-error' : undefined}>
              <legend className="fw-oc-legend">Which case?</legend>
              <p className="fw-muted fw-small fw-oc-hint">Cases racers shared with you. The symptoms and setup come from the case.</p>
              {errorsFor('caseId').map((m) => (
                <p key={m} id="wo-case-error" className="fw-field-error fw-oc-error-text" role="alert">
                  {m}
                </p>
              ))}
              {shared.isPending && <Spinner size={24} aria-label="Loading shared cases" />}
              {shared.isError && <Callout intent="danger">{shared.error.message}</Callout>}
              {shared.data?.length === 0 && <p className="fw-muted">No case is shared with you yet. A racer shares one from the case page.</p>}
              <div className="fw-oc-source">
                {shared.data?.map((c) => (
                  <Radio
                    key={c.id}
                    size="large"
                    name="wo-case"
                    value={c.id}
                    checked={caseId === c.id}
                    onChange={() => setCaseId(c.id)}
                    labelElement={
                      <>
                        <strong className="fw-break-word">
                          {c.ownerName} · {c.kartName}
                        </strong>
                        <span className="fw-oc-desc fw-muted fw-small">
                          Opened {formatDate(c.openedAt)} · {c.state}
                          {c.topCauseId ? ` · likely: ${labels.cause(c.topCauseId)}` : ''}
                        </span>
                      </>
                    }
                  />
                ))}
              </div>
            </fieldset>
          ) : (
            <>
              <TextField id="wo-customer" label="Customer" value={customerName} onChange={setCustomerName} errors={errorsFor('customerName')} maxLength={120} />
              <TextField
                id="wo-kart"
                label="Kart (optional)"
                hint="For example: 125 cc shifter, red chassis."
                value={kartDescription}
                onChange={setKartDescription}
                errors={errorsFor('kartDescription')}
                maxLength={200}
              />
              <FormGroup label="Carburettor" labelFor="wo-kind" helperText="Some causes occur on one kind only.">
                <div id="wo-kind">
                  <SegmentedControl
                    aria-label="Carburettor"
                    size="large"
                    fill
                    options={KIND_OPTIONS}
                    value={kind}
                    onValueChange={(v) => setKind(v as CarburettorKind | '')}
                  />
                </div>
              </FormGroup>
              <fieldset className="fw-oc-fieldset" aria-describedby={errorsFor('symptoms').length ? 'wo-symptoms-error' : undefined}>
                <legend className="fw-oc-legend">What did the customer notice?</legend>
                {errorsFor('symptoms').map((m) => (
                  <p key={m} id="wo-symptoms-error" className="fw-field-error fw-oc-error-text" role="alert">
                    {m}
                  </p>
                ))}
                {catalog.isPending && <Spinner size={24} aria-label="Loading symptoms" />}
                {catalog.isError && <Callout intent="danger">{catalog.error.message}</Callout>}
                <ul className="fw-oc-causes">
                  {catalog.data?.symptoms.map((s) => (
                    <li key={s.id}>
                      <Checkbox
                        size="large"
                        checked={symptoms.includes(s.id)}
                        onChange={(e) => {
                          const on = e.currentTarget.checked;
                          setSymptoms((list) => (on ? [...list, s.id] : list.filter((x) => x !== s.id)));
                        }}
                        labelElement={
                          <>
                            <strong className="fw-break-word">{s.label}</strong>
                            <span className="fw-oc-desc fw-muted fw-small">{s.description}</span>
                          </>
                        }
                      />
                      {symptoms.includes(s.id) && <SymptomCautions cautions={s.cautions} />}
                    </li>
                  ))}
                </ul>
              </fieldset>
            </>
          )}
          <FormGroup label="Notes (optional)" labelFor="wo-notes">
            <TextArea id="wo-notes" fill autoResize value={notes} maxLength={2000} onChange={(e) => setNotes(e.currentTarget.value)} />
          </FormGroup>
          <div className="fw-oc-actions">
            <Button type="submit" className="fw-touch" size="large" intent="primary" loading={create.isPending} text="Open the work order" />
          </div>
        </form>
      </Card>
    </Page>
  );
}
