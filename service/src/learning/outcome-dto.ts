import type { OutcomeRow } from '@fuelwright/db';
import type { OpeningRank } from '@fuelwright/rules';
import type { OutcomeDto, SymptomReport } from '@fuelwright/shared';

export function toOutcomeDto(r: OutcomeRow, loggedByName: string, current: boolean): OutcomeDto {
  const opening = r.openingRank as OpeningRank;
  const top = [...opening.causes].sort((a, b) => b.probability - a.probability)[0];
  return {
    id: r.id,
    caseId: r.caseId,
    workOrderId: r.workOrderId,
    rulesetVersion: r.rulesetVersion,
    symptomIds: (r.symptoms as SymptomReport[]).map((s) => s.id),
    topCauseId: top?.id ?? null,
    confirmedCauses: r.confirmedCauses,
    otherNote: r.otherNote,
    fix: r.fix,
    parts: r.parts,
    labourMinutes: r.labourMinutes,
    stillFixed: r.stillFixed,
    supersedesId: r.supersedesId,
    current,
    loggedByName,
    demo: r.demo,
    at: r.at.toISOString(),
  };
}
