import { Query } from '@nestjs/cqrs';
import type { CaseOutcomeDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

/** The outcomes logged on one case, for anyone who may read the case. */
export class ListCaseOutcomesQuery extends Query<CaseOutcomeDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
  ) {
    super();
  }
}
