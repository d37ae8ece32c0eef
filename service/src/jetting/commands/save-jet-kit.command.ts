import { Command } from '@nestjs/cqrs';
import type { JetKit, JetKitResponse } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class SaveJetKitCommand extends Command<JetKitResponse> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
    public readonly jetKit: JetKit,
  ) {
    super();
  }
}
