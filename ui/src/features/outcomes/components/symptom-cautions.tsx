import type { CatalogResponse, CautionDto } from '@fuelwright/shared';
import { CautionCallout } from '../../../components/caution-callout';

/** The cautions of these symptoms, each once (stop first), from the catalog. */
export function cautionsFor(catalog: CatalogResponse | undefined, symptomIds: readonly string[]): CautionDto[] {
  const seen = new Map<string, CautionDto>();
  for (const id of symptomIds) for (const c of catalog?.symptoms.find((s) => s.id === id)?.cautions ?? []) if (!seen.has(c.id)) seen.set(c.id, c);
  return [...seen.values()].sort((a, b) => Number(b.severity === 'stop') - Number(a.severity === 'stop'));
}

/** Cautions as callouts, each with its icon and the word "Caution" or "Stop" in its title. */
export function SymptomCautions({ cautions }: { cautions: readonly CautionDto[] }) {
  if (cautions.length === 0) return null;
  return (
    <div className="fw-oc-cautions">
      {cautions.map((c) => (
        <CautionCallout key={c.id} kind={c.severity} title={`${c.severity === 'stop' ? 'Stop' : 'Caution'}: ${c.title}`}>
          {c.text}
        </CautionCallout>
      ))}
    </div>
  );
}
