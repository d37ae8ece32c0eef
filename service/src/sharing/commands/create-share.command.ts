import { Command } from '@nestjs/cqrs';
import type { CreateShareRequest, ShareDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class CreateShareCommand extends Command<ShareDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly input: CreateShareRequest,
  ) {
    super();
  }
}
