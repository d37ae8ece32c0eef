import { useState } from 'react';
import { Button, Checkbox } from '@blueprintjs/core';
import { SOMETHING_ELSE_ID, type CatalogResponse } from '@fuelwright/shared';

/**
 * The confirmed causes as large check boxes: the ranking's likely causes first (when there is a
 * ranking), the rest behind "Show all causes", and "Something else" last. Picked causes always show.
 */
export function CausePicker({
  catalog,
  value,
  onChange,
  likely = [],
  error,
}: {
  catalog: CatalogResponse;
  value: string[];
  onChange: (next: string[]) => void;
  /** Cause ids to list first, most likely first. */
  likely?: readonly string[];
  error?: string;
}) {
  const [all, setAll] = useState(likely.length === 0);
  const known = new Map(catalog.causes.map((c) => [c.id, c]));
  const first = likely.filter((id) => known.has(id));
  const rest = catalog.causes.filter((c) => !first.includes(c.id)).sort((a, b) => a.label.localeCompare(b.label));
  const shown = [...first.map((id) => known.get(id)!), ...rest.filter((c) => all || value.includes(c.id))];
  const hidden = rest.length - rest.filter((c) => all || value.includes(c.id)).length;
  const toggle = (id: string, on: boolean) => onChange(on ? [...value, id] : value.filter((v) => v !== id));

  return (
    <fieldset className="fw-oc-fieldset" aria-describedby={error ? 'outcome-causes-error' : undefined}>
      <legend className="fw-oc-legend">What was really wrong?</legend>
      <p className="fw-muted fw-small fw-oc-hint">
        Tick the cause you found. Tick two only if both were faults.
        {first.length > 0 && ' The causes the ranking put highest come first.'}
      </p>
      {error && (
        <p id="outcome-causes-error" className="fw-field-error fw-oc-error-text" role="alert">
          {error}
        </p>
      )}
      <ul className="fw-oc-causes">
        {shown.map((cause) => (
          <li key={cause.id}>
            <Checkbox
              size="large"
              checked={value.includes(cause.id)}
              onChange={(e) => toggle(cause.id, e.currentTarget.checked)}
              labelElement={
                <>
                  <strong className="fw-break-word">{cause.label}</strong>
                  <span className="fw-oc-desc fw-muted fw-small">{cause.description}</span>
                </>
              }
            />
          </li>
        ))}
        {hidden > 0 && (
          <li>
            <Button className="fw-touch" variant="minimal" intent="primary" text={`Show all ${catalog.causes.length} causes`} onClick={() => setAll(true)} />
          </li>
        )}
        <li>
          <Checkbox
            size="large"
            checked={value.includes(SOMETHING_ELSE_ID)}
            onChange={(e) => toggle(SOMETHING_ELSE_ID, e.currentTarget.checked)}
            labelElement={
              <>
                <strong>{catalog.somethingElse.label}</strong>
                <span className="fw-oc-desc fw-muted fw-small">None of the causes above: say what it was below.</span>
              </>
            }
          />
        </li>
      </ul>
    </fieldset>
  );
}
