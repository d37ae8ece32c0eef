import { Command } from '@nestjs/cqrs';
import type { SessionUser } from '../../common/session-user.js';

export class DeleteSessionCommand extends Command<void> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
    public readonly sessionId: string,
  ) {
    super();
  }
}
