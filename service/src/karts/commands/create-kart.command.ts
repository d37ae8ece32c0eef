import { Command } from '@nestjs/cqrs';
import type { KartDto, KartInput } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class CreateKartCommand extends Command<KartDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly input: KartInput,
  ) {
    super();
  }
}
