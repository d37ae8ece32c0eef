import { Command } from '@nestjs/cqrs';
import type { AcceptInvitationResponse } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class AcceptInvitationCommand extends Command<AcceptInvitationResponse> {
  constructor(
    public readonly user: SessionUser,
    public readonly token: string,
  ) {
    super();
  }
}
