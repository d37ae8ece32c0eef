import { Command } from '@nestjs/cqrs';
import type { CaseDto, RecordCheckResultRequest } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class RecordCheckResultCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly input: RecordCheckResultRequest,
  ) {
    super();
  }
}
