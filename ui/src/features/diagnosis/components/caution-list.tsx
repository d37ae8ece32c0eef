import type { CautionDto } from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';

/** Cautions as callouts, each with its icon and the word "Caution" or "Stop" in its title. */
export function CautionList({ cautions }: { cautions: readonly CautionDto[] }) {
  if (cautions.length === 0) return null;
  return (
    <div className="fw-diag-cautions">
      {cautions.map((caution) => (
        <CautionCallout
          key={caution.id}
          kind={caution.severity}
          title={`${caution.severity === 'stop' ? 'Stop' : 'Caution'}: ${caution.title}`}
        >
          {caution.text}
        </CautionCallout>
      ))}
    </div>
  );
}
