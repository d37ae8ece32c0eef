import { Query } from '@nestjs/cqrs';
import type { OutcomeDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

/** The outcomes logged on one case, for anyone who may read the case. */
export class ListCaseOutcomesQuery extends Query<OutcomeDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
  ) {
    super();
  }
}
