import { Spinner } from '@blueprintjs/core';

export function PageSpinner({ label = 'Loading' }: { label?: string }) {
  return (
    <div className="fw-page-spinner" role="status" aria-live="polite">
      <Spinner size={40} aria-label={label} />
      <span className="fw-visually-hidden">{label}</span>
    </div>
  );
}
