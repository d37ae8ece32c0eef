import { Command } from '@nestjs/cqrs';
import type { CaseDto, ResolveCaseRequest } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class ResolveCaseCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly input: ResolveCaseRequest,
  ) {
    super();
  }
}
