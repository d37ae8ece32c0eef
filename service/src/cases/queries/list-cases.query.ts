import { Query } from '@nestjs/cqrs';
import type { CaseState, CaseSummaryDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export interface CaseListFilter {
  state?: CaseState;
  kartId?: string;
}

export class ListCasesQuery extends Query<CaseSummaryDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly filter: CaseListFilter,
  ) {
    super();
  }
}
