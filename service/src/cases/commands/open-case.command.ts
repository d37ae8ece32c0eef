import { Command } from '@nestjs/cqrs';
import type { CaseDto, OpenCaseRequest } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class OpenCaseCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly input: OpenCaseRequest,
  ) {
    super();
  }
}
