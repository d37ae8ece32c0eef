import { Command } from '@nestjs/cqrs';
import type { ShareDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class RevokeShareCommand extends Command<ShareDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly shareId: string,
  ) {
    super();
  }
}
