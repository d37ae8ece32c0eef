import { useState, type FormEvent, type JSX } from 'react';
import { Button, Callout, FormGroup, TextArea } from '@blueprintjs/core';
import {
  CARBURETTOR_KINDS,
  DRIVES,
  DRIVE_LABELS,
  KART_NAME_MAX_LENGTH,
  KART_NOTES_MAX_LENGTH,
  type CarburettorKind,
  type Drive,
  type KartInput,
} from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import { formErrors } from '../../../lib/form-errors';
import { KART_FORM_FIELDS, validateKartForm, type KartFormValues } from '../lib/kart-form';
import { focusField } from '../lib/focus-field';
import { ChoiceField } from './choice-field';

const CARB_OPTIONS: { value: CarburettorKind; label: string }[] = [
  { value: 'pump-around', label: 'Pump-around' },
  { value: 'float-valve', label: 'Float-valve' },
];
const DRIVE_OPTIONS = DRIVES.map((drive) => ({ value: drive, label: DRIVE_LABELS[drive] }));

/**
 * Add or edit a kart. Values stay as typed whatever the server answers; the server's messages
 * show under their fields.
 */
export function KartForm({
  idPrefix,
  initial,
  submitText,
  submitIcon,
  pending,
  error,
  onSubmit,
  onCancel,
}: {
  idPrefix: string;
  initial: KartFormValues;
  submitText: string;
  submitIcon?: JSX.Element;
  pending: boolean;
  error: unknown;
  onSubmit: (input: KartInput) => void;
  onCancel?: () => void;
}) {
  const [values, setValues] = useState<KartFormValues>(initial);
  const [submitted, setSubmitted] = useState(false);
  const [sentValues, setSentValues] = useState<KartFormValues | null>(null);
  const set = (patch: Partial<KartFormValues>) => setValues((current) => ({ ...current, ...patch }));

  const client = validateKartForm(values);
  const server = formErrors(error, KART_FORM_FIELDS);
  const fieldErrors = (field: (typeof KART_FORM_FIELDS)[number]): string[] => {
    if (submitted && client.errors[field]) return client.errors[field];
    // A server message stays until the field is changed.
    return sentValues && sentValues[field] === values[field] ? server.field(field) : [];
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSubmitted(true);
    if (!client.input) {
      const first = KART_FORM_FIELDS.find((field) => client.errors[field]);
      if (first) focusField(`${idPrefix}-${first}`);
      return;
    }
    setSentValues(values);
    onSubmit(client.input);
  };

  return (
    <form onSubmit={submit} noValidate aria-label={submitText} className="fw-kart-form">
      <div className="fw-form-grid">
        <TextField
          id={`${idPrefix}-name`}
          label="Name"
          autoComplete="off"
          maxLength={KART_NAME_MAX_LENGTH}
          value={values.name}
          onChange={(name) => set({ name })}
          errors={fieldErrors('name')}
          hint="The number or nickname you know the kart by."
        />
        <TextField
          id={`${idPrefix}-displacementCc`}
          label="Engine size (cc)"
          inputMode="numeric"
          autoComplete="off"
          value={values.displacementCc}
          onChange={(displacementCc) => set({ displacementCc })}
          errors={fieldErrors('displacementCc')}
          hint="The displacement stamped on the engine or in its papers, e.g. 125. Two-stroke only."
        />
      </div>
      <ChoiceField<Drive | ''>
        id={`${idPrefix}-drive`}
        label="Drive"
        value={values.drive}
        options={DRIVE_OPTIONS}
        onChange={(drive) => set({ drive })}
        errors={fieldErrors('drive')}
        hint="Gearbox: a shifter with a clutch. Direct drive: no gearbox, no clutch."
      />
      <ChoiceField<CarburettorKind | ''>
        id={`${idPrefix}-carburettorKind`}
        label="Carburettor"
        value={values.carburettorKind}
        options={CARB_OPTIONS.filter((option) => CARBURETTOR_KINDS.includes(option.value))}
        onChange={(carburettorKind) => set({ carburettorKind })}
        errors={fieldErrors('carburettorKind')}
        hint="Pump-around: a pump fills the bowl and a return tube takes the surplus back to the tank (no float). Float-valve: a float and needle valve keep the level."
      />
      <FormGroup
        label="Notes"
        labelFor={`${idPrefix}-notes`}
        intent={fieldErrors('notes').length > 0 ? 'danger' : 'none'}
        helperText={
          <span id={`${idPrefix}-notes-help`} className="fw-field-help">
            {fieldErrors('notes').length > 0
              ? fieldErrors('notes').map((message) => <span key={message} className="fw-field-error">{message}</span>)
              : 'Anything worth remembering: chassis, engine hours, who set it up last.'}
          </span>
        }
      >
        <TextArea
          id={`${idPrefix}-notes`}
          fill
          autoResize
          maxLength={KART_NOTES_MAX_LENGTH}
          value={values.notes}
          onChange={(event) => set({ notes: event.currentTarget.value })}
          aria-describedby={`${idPrefix}-notes-help`}
          intent={fieldErrors('notes').length > 0 ? 'danger' : 'none'}
        />
      </FormGroup>
      {submitted && !client.input && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          Check the fields marked in red.
        </Callout>
      )}
      {client.input && server.form && sentValues && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {server.form}
        </Callout>
      )}
      <div className="fw-form-actions">
        <Button className="fw-touch" type="submit" intent="primary" size="large" icon={submitIcon} text={submitText} loading={pending} />
        {onCancel && <Button className="fw-touch" size="large" variant="minimal" text="Cancel" onClick={onCancel} disabled={pending} />}
      </div>
    </form>
  );
}
