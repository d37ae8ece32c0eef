import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { SessionService } from '../session.service.js';
import { SignOutCommand } from './sign-out.command.js';

@CommandHandler(SignOutCommand)
export class SignOutHandler implements ICommandHandler<SignOutCommand> {
  constructor(private readonly sessions: SessionService) {}

  async execute(cmd: SignOutCommand): Promise<void> {
    await this.sessions.revoke(cmd.sessionId);
  }
}
