import { Command } from '@nestjs/cqrs';
import type { CaseDto, CorrectCaseFactsRequest } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class CorrectCaseFactsCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly input: CorrectCaseFactsRequest,
  ) {
    super();
  }
}
