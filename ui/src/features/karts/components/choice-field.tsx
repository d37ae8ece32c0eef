import type { ReactNode } from 'react';
import { FormGroup, SegmentedControl } from '@blueprintjs/core';

/**
 * A labelled row of large buttons for a choice among a few options (easier with gloves than a
 * drop-down), with its hint or its errors underneath.
 */
export function ChoiceField<T extends string>({
  id,
  label,
  value,
  options,
  onChange,
  errors = [],
  hint,
  disabled,
}: {
  id: string;
  label: ReactNode;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  errors?: readonly string[];
  hint?: ReactNode;
  disabled?: boolean;
}) {
  const invalid = errors.length > 0;
  const helper =
    invalid || hint ? (
      <span id={`${id}-help`} className="fw-field-help">
        {invalid ? errors.map((message) => <span key={message} className="fw-field-error">{message}</span>) : hint}
      </span>
    ) : undefined;
  return (
    <FormGroup label={label} labelFor={id} intent={invalid ? 'danger' : 'none'} helperText={helper}>
      <div id={id} className={invalid ? 'fw-choice fw-choice-invalid' : 'fw-choice'}>
        <SegmentedControl
          aria-label={typeof label === 'string' ? label : undefined}
          aria-describedby={helper ? `${id}-help` : undefined}
          aria-invalid={invalid || undefined}
          size="large"
          fill
          disabled={disabled}
          options={options.map((option) => ({ value: option.value, label: option.label }))}
          value={value}
          onValueChange={(next) => onChange(next as T)}
        />
      </div>
    </FormGroup>
  );
}
