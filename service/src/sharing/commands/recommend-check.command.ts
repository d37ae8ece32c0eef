import { Command } from '@nestjs/cqrs';
import type { CaseDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class RecommendCheckCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly checkId: string,
    public readonly reason: string,
  ) {
    super();
  }
}
