import { DiagnosisIcon } from '@blueprintjs/icons';
import { paths } from '../../../app/paths';
import { CautionCallout } from '../../../components/caution-callout';
import { ComingNext } from '../../../components/coming-next';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { useCurrentUser } from '../../../lib/current-user';

/**
 * The public entry to a quick diagnosis. The guided diagnosis itself is a later update; this page
 * already shows the cautions that come before any work on the kart.
 */
export function QuickDiagnosisPage() {
  const user = useCurrentUser();
  return (
    <Page
      title={
        <>
          <DiagnosisIcon size={28} className="fw-title-icon" /> Quick diagnosis
        </>
      }
      lead="Say what the engine does and where it shows, and get the likely causes with a check plan."
    >
      <CautionCallout>
        <ul className="fw-caution-list">
          <li>
            Work on a cold engine with the ignition off. Fuel and its vapour catch fire easily: no sparks, flames or
            smoking nearby, and keep a fire extinguisher within reach.
          </li>
          <li>Never run the engine on a stand unless the kart is secured and nobody stands by the rear wheels or the chain.</li>
          <li>
            Your local rules and the track&apos;s technical inspection come first. When in doubt, ask a qualified engine
            builder.
          </li>
        </ul>
      </CautionCallout>
      <CautionCallout kind="stop">
        If the throttle sticks or does not return, if fuel leaks near the exhaust, or if you see signs of a lean
        seizure: do not drive. See a qualified engine builder.
      </CautionCallout>
      <ComingNext
        title="Quick diagnosis: coming next"
        action={
          user ? undefined : (
            <LinkButton className="fw-touch" size="large" to={paths.signUp} text="Create an account to save cases" />
          )
        }
      >
        You will pick the symptoms (in which throttle band, cold or warm, on corner entry or exit, on the straight),
        and Fuelwright will rank the likely causes and plan the checks, quickest first. Nothing is saved without an
        account.
      </ComingNext>
    </Page>
  );
}
