import { CautionCallout } from '../../../components/caution-callout';

/** The cautions before any work on a kart, shown at the start of every walk-through. */
export function GeneralCaution() {
  return (
    <CautionCallout title="Caution: before you touch the kart">
      <ul className="fw-caution-list">
        <li>
          Work on a cold engine with the ignition off. Fuel and its vapour catch fire easily: no sparks, flames or smoking
          nearby, and keep a fire extinguisher within reach.
        </li>
        <li>Never run the engine on a stand unless the kart is secured and nobody stands by the rear wheels or the chain.</li>
        <li>
          If the throttle sticks or does not snap back, if fuel leaks near the exhaust, or if you see signs of a lean seizure: do
          not drive, and see a qualified engine builder. Your local rules and the track&apos;s technical inspection come first.
        </li>
      </ul>
    </CautionCallout>
  );
}
