import type { StopFinding } from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';

/** The full-width Stop: a finding that ends the walk-through. */
export function StopCallout({ stop, checkLabel }: { stop: StopFinding; checkLabel?: string }) {
  return (
    <div className="fw-diag-stop" role="alert">
      <CautionCallout kind="stop" title="Stop: do not drive. See a qualified engine builder.">
        {checkLabel && (
          <p>
            Found on the check <strong>{checkLabel}</strong>.
          </p>
        )}
        <p>{stop.reason}</p>
        {!/technical inspection/i.test(stop.reason) && (
          <p>Do not start or drive the kart until a qualified engine builder has looked at it. Your local rules and the track&apos;s technical inspection come first.</p>
        )}
      </CautionCallout>
    </div>
  );
}
