import { useState, type FormEvent, type ReactNode } from 'react';
import { Button, Callout, FormGroup, H3, Tag, TextArea } from '@blueprintjs/core';
import { FloppyDiskIcon } from '@blueprintjs/icons';
import { type CarburettorKind, type IdleScrewState, type SetupDto } from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { formErrors } from '../../../lib/form-errors';
import { SETUP_FIELD_HINTS, SETUP_FIELD_LABELS } from '../../../lib/setup-fields';
import { useRecordSetup } from '../api/record-setup';
import { focusField } from '../lib/focus-field';
import {
  SETUP_FORM_FIELDS,
  SETUP_NOTE_MAX_LENGTH,
  setupFormFrom,
  todayIso,
  validateSetupForm,
  type SetupFormField,
  type SetupFormValues,
  type YesNo,
} from '../lib/setup-form';
import { ChoiceField } from './choice-field';

const ID = 'setup';
const fieldId = (field: SetupFormField) => `${ID}-${field}`;

const IDLE_OPTIONS: { value: IdleScrewState | ''; label: string }[] = [
  { value: '', label: 'Not recorded' },
  { value: 'backed-off', label: 'Backed off' },
  { value: 'set', label: 'Set' },
];
const YES_NO_OPTIONS: { value: YesNo; label: string }[] = [
  { value: '', label: 'Not recorded' },
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

function Unit({ children }: { children: ReactNode }) {
  return (
    <Tag minimal className="fw-input-unit">
      {children}
    </Tag>
  );
}

function FieldGroup({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="fw-fieldset">
      <legend>
        <H3 className="fw-fieldset-title">{title}</H3>
      </legend>
      <div className="fw-form-grid">{children}</div>
    </fieldset>
  );
}

/**
 * Records a dated setup snapshot for one kart, starting from the latest one. Each field says
 * what it is and where to find it; the same ranges as the server are checked before sending, and
 * the server's own messages show under their fields. Nothing typed is lost on an error.
 */
export function SetupForm({
  kartId,
  carburettorKind,
  latest,
  onRecorded,
  onCancel,
}: {
  kartId: string;
  carburettorKind: CarburettorKind;
  latest: SetupDto | undefined;
  onRecorded?: (setup: SetupDto) => void;
  onCancel?: () => void;
}) {
  const [today] = useState(() => todayIso());
  const [values, setValues] = useState<SetupFormValues>(() => setupFormFrom(latest, today));
  const [submitted, setSubmitted] = useState(false);
  const [sentValues, setSentValues] = useState<SetupFormValues | null>(null);
  const record = useRecordSetup(kartId);
  const notify = useNotify();
  const set = (patch: Partial<SetupFormValues>) => setValues((current) => ({ ...current, ...patch }));

  const client = validateSetupForm(values, todayIso());
  const server = formErrors(record.error, SETUP_FORM_FIELDS);
  const errorsOf = (field: SetupFormField): string[] => {
    if (submitted && client.errors[field]) return client.errors[field];
    // The server's message stays under its field until that field is changed.
    return sentValues && sentValues[field] === values[field] ? server.field(field) : [];
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSubmitted(true);
    if (!client.input) {
      const first = SETUP_FORM_FIELDS.find((field) => client.errors[field]);
      if (first) focusField(fieldId(first));
      return;
    }
    setSentValues(values);
    record.mutate(client.input, {
      onSuccess: (setup) => {
        notify.success(
          setup.changedFields.length > 0
            ? `Setup recorded. Changed: ${setup.changedFields.map((f) => SETUP_FIELD_LABELS[f].toLowerCase()).join(', ')}.`
            : 'Setup recorded.',
        );
        setSubmitted(false);
        setSentValues(null);
        setValues(setupFormFrom(setup, todayIso()));
        onRecorded?.(setup);
      },
    });
  };

  const text = (field: Exclude<SetupFormField, 'idleScrew' | 'ventLinesFitted' | 'ventLinesRoutedUp' | 'note'>, props: {
    label: string;
    hint: ReactNode;
    unit?: string;
    type?: 'date';
    placeholder?: string;
  }) => (
    <TextField
      id={fieldId(field)}
      label={props.label}
      type={props.type ?? 'text'}
      inputMode={props.type ? undefined : 'decimal'}
      autoComplete="off"
      placeholder={props.placeholder}
      max={props.type === 'date' ? today : undefined}
      value={values[field]}
      onChange={(value) => set({ [field]: value } as Partial<SetupFormValues>)}
      errors={errorsOf(field)}
      hint={props.hint}
      rightElement={props.unit ? <Unit>{props.unit}</Unit> : undefined}
    />
  );

  const noteErrors = errorsOf('note');
  const foamHint =
    carburettorKind === 'pump-around'
      ? SETUP_FIELD_HINTS.foamFittedDate
      : 'Only pump-around bowls hold foam blocks; on this float-valve carburettor leave it empty.';

  return (
    <form className="fw-setup-form" onSubmit={submit} noValidate aria-label="Record a setup">
      <CautionCallout>
        Reading the jets and the needle clip means opening the carburettor. Do it with the engine off and cold, the
        fuel pump or tap off, away from sparks and flames, with a rag for spilled fuel and an extinguisher within reach.
        Follow your local rules and the track&apos;s technical inspection; if unsure, ask a qualified engine builder.
      </CautionCallout>
      {latest ? (
        <p className="fw-muted fw-form-lead">Filled in from your latest setup: change what is different today.</p>
      ) : (
        <p className="fw-muted fw-form-lead">
          No setup recorded yet. A dated setup lets the diagnosis use your jets, clip and screws: fill in what you know and
          leave the rest empty.
        </p>
      )}

      <FieldGroup title="When">
        {text('takenOn', { label: 'Date taken', type: 'date', hint: 'The day the kart ran with this setup (today or earlier).' })}
      </FieldGroup>

      <FieldGroup title="Jets and needle">
        {text('mainJet', { label: SETUP_FIELD_LABELS.mainJet, hint: SETUP_FIELD_HINTS.mainJet, placeholder: 'e.g. 185' })}
        {text('pilotJet', { label: SETUP_FIELD_LABELS.pilotJet, hint: SETUP_FIELD_HINTS.pilotJet, placeholder: 'e.g. 37.5' })}
        {text('needleClipGroove', {
          label: `${SETUP_FIELD_LABELS.needleClipGroove} (from the top)`,
          hint: SETUP_FIELD_HINTS.needleClipGroove,
          placeholder: '1 to 7',
        })}
      </FieldGroup>

      <FieldGroup title="Screws">
        {text('airScrewTurnsOut', {
          label: `${SETUP_FIELD_LABELS.airScrewTurnsOut} (turns out)`,
          hint: SETUP_FIELD_HINTS.airScrewTurnsOut,
          unit: 'turns out',
          placeholder: 'e.g. 1.5',
        })}
        <ChoiceField<IdleScrewState | ''>
          id={fieldId('idleScrew')}
          label={SETUP_FIELD_LABELS.idleScrew}
          value={values.idleScrew}
          options={IDLE_OPTIONS}
          onChange={(idleScrew) => set({ idleScrew, ...(idleScrew === 'backed-off' && values.idleScrewTurns === '' ? { idleScrewTurns: '0' } : {}) })}
          errors={errorsOf('idleScrew')}
          hint={SETUP_FIELD_HINTS.idleScrew}
        />
        {text('idleScrewTurns', {
          label: `${SETUP_FIELD_LABELS.idleScrewTurns} (in)`,
          hint: SETUP_FIELD_HINTS.idleScrewTurns,
          unit: 'turns in',
        })}
      </FieldGroup>

      <FieldGroup title="Fuel and upkeep">
        {text('premixRatio', { label: SETUP_FIELD_LABELS.premixRatio, hint: SETUP_FIELD_HINTS.premixRatio, unit: ': 1', placeholder: 'e.g. 32' })}
        {text('foamFittedDate', { label: 'Foam fitted on', type: 'date', hint: foamHint })}
        {text('lastRebuildDate', { label: 'Last rebuild on', type: 'date', hint: SETUP_FIELD_HINTS.lastRebuildDate })}
        <ChoiceField<YesNo>
          id={fieldId('ventLinesFitted')}
          label={SETUP_FIELD_LABELS.ventLinesFitted}
          value={values.ventLinesFitted}
          options={YES_NO_OPTIONS}
          onChange={(ventLinesFitted) => set({ ventLinesFitted })}
          errors={errorsOf('ventLinesFitted')}
          hint={SETUP_FIELD_HINTS.ventLinesFitted}
        />
        {values.ventLinesFitted !== 'no' && (
          <ChoiceField<YesNo>
            id={fieldId('ventLinesRoutedUp')}
            label={SETUP_FIELD_LABELS.ventLinesRoutedUp}
            value={values.ventLinesRoutedUp}
            options={YES_NO_OPTIONS}
            onChange={(ventLinesRoutedUp) => set({ ventLinesRoutedUp })}
            errors={errorsOf('ventLinesRoutedUp')}
            hint={SETUP_FIELD_HINTS.ventLinesRoutedUp}
          />
        )}
      </FieldGroup>

      <FormGroup
        label="Note"
        labelFor={fieldId('note')}
        intent={noteErrors.length > 0 ? 'danger' : 'none'}
        helperText={
          <span id={`${fieldId('note')}-help`} className="fw-field-help">
            {noteErrors.length > 0
              ? noteErrors.map((message) => <span key={message} className="fw-field-error">{message}</span>)
              : 'Weather, track, how it ran, what you changed and why.'}
          </span>
        }
      >
        <TextArea
          id={fieldId('note')}
          fill
          autoResize
          maxLength={SETUP_NOTE_MAX_LENGTH}
          value={values.note}
          onChange={(event) => set({ note: event.currentTarget.value })}
          aria-describedby={`${fieldId('note')}-help`}
          intent={noteErrors.length > 0 ? 'danger' : 'none'}
        />
      </FormGroup>

      {submitted && !client.input && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          Check the fields marked in red: nothing was saved yet.
        </Callout>
      )}
      {client.input && sentValues && record.isError && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {server.form ?? 'The setup was not saved: check the fields marked in red.'}
        </Callout>
      )}
      <div className="fw-form-actions">
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<FloppyDiskIcon />} text="Save setup" loading={record.isPending} />
        {onCancel && <Button className="fw-touch" size="large" variant="minimal" text="Cancel" onClick={onCancel} disabled={record.isPending} />}
      </div>
    </form>
  );
}
