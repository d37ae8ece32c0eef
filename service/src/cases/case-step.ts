import { ConflictException } from '@nestjs/common';
import type { CaseEventType } from '@fuelwright/shared';
import { AccessPolicy } from '../common/access/access-policy.js';
import type { SessionUser } from '../common/session-user.js';
import { canApply, resultsMap } from './case-projection.js';
import { CaseStore, type LoadedCase } from './case-store.js';

/** Loads a case the user may change, and refuses a step the case's state does not take. */
export async function loadForStep(store: CaseStore, access: AccessPolicy, user: SessionUser, caseId: string, step: CaseEventType): Promise<LoadedCase> {
  const loaded = await store.load(caseId);
  access.require(user, loaded && { ...loaded, ownerId: loaded.row.ownerId }, 'edit', 'case');
  if (!canApply(loaded!.projection.state, step)) {
    throw new ConflictException(`This case is ${loaded!.projection.state}; it no longer takes that step.`);
  }
  return loaded!;
}

export function factsOf(l: LoadedCase) {
  const p = l.projection;
  return { symptoms: p.symptoms, setup: p.setup, conditions: p.conditions, results: resultsMap(p), displacementCc: l.kartDisplacementCc };
}

