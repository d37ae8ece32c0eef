import { Command } from '@nestjs/cqrs';
import type { SetupDto, SetupInput } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class RecordSetupCommand extends Command<SetupDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
    public readonly input: SetupInput,
  ) {
    super();
  }
}
