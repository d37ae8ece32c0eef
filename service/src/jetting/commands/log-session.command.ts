import { Command } from '@nestjs/cqrs';
import type { JettingSessionDto, JettingSessionInput } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class LogSessionCommand extends Command<JettingSessionDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
    public readonly input: JettingSessionInput,
  ) {
    super();
  }
}
