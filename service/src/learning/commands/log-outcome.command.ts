import { Command } from '@nestjs/cqrs';
import type { LogOutcomeRequest, OutcomeDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class LogOutcomeCommand extends Command<OutcomeDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly input: LogOutcomeRequest,
  ) {
    super();
  }
}
