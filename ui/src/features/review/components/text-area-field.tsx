import type { ReactNode } from 'react';
import { FormGroup, TextArea } from '@blueprintjs/core';

/**
 * A labelled text area with its errors (or hint) underneath and a count of what is left near the
 * limit. The value is the caller's, so nothing typed is lost when the server refuses it.
 */
export function TextAreaField({
  id,
  label,
  value,
  onChange,
  maxLength,
  errors = [],
  hint,
  placeholder,
  rows = 3,
}: {
  id: string;
  label: ReactNode;
  value: string;
  onChange: (value: string) => void;
  maxLength: number;
  errors?: readonly string[];
  hint?: ReactNode;
  placeholder?: string;
  rows?: number;
}) {
  const invalid = errors.length > 0;
  const left = maxLength - value.length;
  const helpId = `${id}-help`;
  const helper = (
    <span id={helpId} className="fw-field-help">
      {invalid ? errors.map((message) => <span key={message} className="fw-field-error">{message}</span>) : hint}
      {left <= Math.max(50, maxLength / 10) && (
        <span className="fw-review-count" aria-live="polite">
          {left} {left === 1 ? 'character' : 'characters'} left
        </span>
      )}
    </span>
  );
  return (
    <FormGroup label={label} labelFor={id} intent={invalid ? 'danger' : 'none'} helperText={helper}>
      <TextArea
        id={id}
        fill
        autoResize
        rows={rows}
        size="large"
        maxLength={maxLength}
        placeholder={placeholder}
        value={value}
        onChange={(event) => onChange(event.currentTarget.value)}
        intent={invalid ? 'danger' : 'none'}
        aria-invalid={invalid || undefined}
        aria-describedby={helpId}
      />
    </FormGroup>
  );
}
