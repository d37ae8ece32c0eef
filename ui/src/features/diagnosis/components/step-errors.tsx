import { Callout } from '@blueprintjs/core';
import type { WalkThroughError } from '../machines/walk-through-model';

/**
 * What a form step shows above its fields when sending failed: the error itself (anything but a
 * 400), and the server's field messages that no field on the step shows under it.
 */
export function StepErrors({ error, otherMessages }: { error: WalkThroughError | null; otherMessages: string[] }) {
  return (
    <>
      {error && error.status !== 400 && (
        <Callout intent="danger" role="alert" className="fw-form-error">
          {error.message}
        </Callout>
      )}
      {otherMessages.length > 0 && (
        <Callout intent="danger" role="alert" className="fw-form-error" title="Some details were not accepted">
          <ul className="fw-diag-plain-list">
            {otherMessages.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
        </Callout>
      )}
    </>
  );
}
