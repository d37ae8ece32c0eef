import { Command } from '@nestjs/cqrs';
import type { SessionUser } from '../../common/session-user.js';

export class DeleteKartCommand extends Command<void> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
  ) {
    super();
  }
}
