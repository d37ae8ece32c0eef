import type { ReactNode } from 'react';
import { FormGroup, HTMLSelect } from '@blueprintjs/core';
import { SETUP_RANGES } from '@fuelwright/shared';
import { TextField } from '../../../components/text-field';
import { todayIso, type SetupDraft, type SetupDraftField } from '../machines/walk-through-model';

/** Each setup value with what it is, in trade words. */
const NUMBER_FIELDS: { field: 'mainJet' | 'pilotJet' | 'needleClipGroove' | 'airScrewTurnsOut' | 'idleScrewTurns' | 'premixRatio'; label: string; hint: string; placeholder: string }[] = [
  { field: 'mainJet', label: 'Main jet', hint: 'The number stamped on the main jet. It feeds the engine from 3/4 to full throttle.', placeholder: 'e.g. 185' },
  { field: 'pilotJet', label: 'Pilot jet', hint: 'The number on the small (slow) jet. It feeds the engine from closed to 1/8 throttle.', placeholder: 'e.g. 37.5' },
  { field: 'needleClipGroove', label: 'Needle clip groove', hint: 'Which groove the clip sits in, counted from the top of the needle (1 = top).', placeholder: '1 to 7' },
  { field: 'airScrewTurnsOut', label: 'Air screw, turns out', hint: 'Turns out from lightly seated; quarter turns are fine (1.75).', placeholder: 'e.g. 1.5' },
  { field: 'idleScrewTurns', label: 'Idle screw, turns in', hint: 'Turns in from where it just touches the slide.', placeholder: 'e.g. 1' },
  { field: 'premixRatio', label: 'Premix ratio (fuel to oil)', hint: '32 means 32 parts fuel to 1 part oil.', placeholder: 'e.g. 32' },
];

function SelectField({
  id,
  label,
  value,
  onChange,
  options,
  hint,
  errors = [],
}: {
  id: string;
  label: ReactNode;
  value: string;
  onChange: (value: string) => void;
  options: { value: string; label: string }[];
  hint?: ReactNode;
  errors?: string[];
}) {
  const invalid = errors.length > 0;
  return (
    <FormGroup
      label={label}
      labelFor={id}
      intent={invalid ? 'danger' : 'none'}
      helperText={invalid ? errors.map((m) => <span key={m} className="fw-field-error">{m}</span>) : hint}
    >
      <HTMLSelect id={id} large fill value={value} onChange={(event) => onChange(event.currentTarget.value)} options={options} />
    </FormGroup>
  );
}

const YES_NO = [
  { value: '', label: 'Not sure' },
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

/**
 * The setup values a racer may know, all optional. Text stays as typed (the machine keeps the
 * draft), so a half-typed number or a rejected value is never lost.
 */
export function SetupFields({
  draft,
  onChange,
  errorsFor,
  disabled = false,
}: {
  draft: SetupDraft;
  onChange: (field: SetupDraftField, value: string) => void;
  errorsFor: (field: SetupDraftField) => string[];
  disabled?: boolean;
}) {
  const value = (field: SetupDraftField) => draft[field] ?? '';
  const idleSet = value('idleScrew') === 'set';
  const ventsFitted = value('ventLinesFitted') !== 'no';
  const today = todayIso();
  return (
    <div className="fw-diag-setup-grid">
      {NUMBER_FIELDS.filter((f) => f.field !== 'idleScrewTurns').map(({ field, label, hint, placeholder }) => (
        <TextField
          key={field}
          id={`setup-${field}`}
          label={label}
          inputMode="decimal"
          placeholder={placeholder}
          value={value(field)}
          onChange={(next) => onChange(field, next)}
          errors={errorsFor(field)}
          hint={`${hint} (${SETUP_RANGES[field].min} to ${SETUP_RANGES[field].max})`}
          disabled={disabled}
        />
      ))}
      <SelectField
        id="setup-idleScrew"
        label="Idle screw"
        value={value('idleScrew')}
        onChange={(next) => onChange('idleScrew', next)}
        options={[
          { value: '', label: 'Not sure' },
          { value: 'backed-off', label: 'Backed off (no idle)' },
          { value: 'set', label: 'Set (holds an idle)' },
        ]}
        hint="Set means the screw holds the slide a little open at closed throttle."
        errors={errorsFor('idleScrew')}
      />
      {idleSet && (
        <TextField
          id="setup-idleScrewTurns"
          label="Idle screw, turns in"
          inputMode="decimal"
          placeholder="e.g. 1"
          value={value('idleScrewTurns')}
          onChange={(next) => onChange('idleScrewTurns', next)}
          errors={errorsFor('idleScrewTurns')}
          hint="Turns in from where it just touches the slide."
          disabled={disabled}
        />
      )}
      <TextField
        id="setup-foamFittedDate"
        label="Bowl foam fitted on"
        type="date"
        max={today}
        value={value('foamFittedDate')}
        onChange={(next) => onChange('foamFittedDate', next)}
        errors={errorsFor('foamFittedDate')}
        hint="Pump-around bowls: the day the foam blocks were last replaced."
        disabled={disabled}
      />
      <TextField
        id="setup-lastRebuildDate"
        label="Last carburettor rebuild"
        type="date"
        max={today}
        value={value('lastRebuildDate')}
        onChange={(next) => onChange('lastRebuildDate', next)}
        errors={errorsFor('lastRebuildDate')}
        hint="New gaskets, needle and clip."
        disabled={disabled}
      />
      <SelectField
        id="setup-ventLinesFitted"
        label="Vent lines fitted"
        value={value('ventLinesFitted')}
        onChange={(next) => onChange('ventLinesFitted', next)}
        options={YES_NO}
        hint="Small hoses on the carburettor's vent nipples."
        errors={errorsFor('ventLinesFitted')}
      />
      {ventsFitted && (
        <SelectField
          id="setup-ventLinesRoutedUp"
          label="Vent lines routed up"
          value={value('ventLinesRoutedUp')}
          onChange={(next) => onChange('ventLinesRoutedUp', next)}
          options={YES_NO}
          hint="Running upward from the nipples, not hanging down."
          errors={errorsFor('ventLinesRoutedUp')}
        />
      )}
    </div>
  );
}
