import { Query } from '@nestjs/cqrs';
import type { CaseDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class GetCaseQuery extends Query<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
  ) {
    super();
  }
}
