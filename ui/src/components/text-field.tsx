import type { ComponentProps, ReactNode } from 'react';
import { FormGroup, InputGroup } from '@blueprintjs/core';

type InputProps = Omit<ComponentProps<typeof InputGroup>, 'id' | 'intent' | 'size' | 'value' | 'onChange' | 'onValueChange'>;

/**
 * A labelled, large text input with its errors underneath. The value is controlled by the caller,
 * so nothing typed is lost when the server rejects a submit.
 */
export function TextField({
  id,
  label,
  value,
  onChange,
  errors = [],
  hint,
  ...inputProps
}: InputProps & {
  id: string;
  label: ReactNode;
  value: string;
  onChange: (value: string) => void;
  errors?: readonly string[];
  hint?: ReactNode;
}) {
  const invalid = errors.length > 0;
  const helpId = `${id}-help`;
  const helper =
    invalid || hint ? (
      <span id={helpId} className="fw-field-help">
        {invalid ? errors.map((message) => <span key={message} className="fw-field-error">{message}</span>) : hint}
      </span>
    ) : undefined;
  return (
    <FormGroup label={label} labelFor={id} intent={invalid ? 'danger' : 'none'} helperText={helper}>
      <InputGroup
        {...inputProps}
        id={id}
        size="large"
        fill
        intent={invalid ? 'danger' : 'none'}
        value={value}
        onValueChange={(next) => onChange(next)}
        aria-invalid={invalid || undefined}
        aria-describedby={helper ? helpId : undefined}
      />
    </FormGroup>
  );
}
