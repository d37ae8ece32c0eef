import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { hashPassword } from '../password.js';
import { SessionService } from '../session.service.js';
import { toUserDto } from '../user-dto.js';
import { SignUpCommand } from './sign-up.command.js';

/** New accounts are racers; an admin changes the role. */
@CommandHandler(SignUpCommand)
export class SignUpHandler implements ICommandHandler<SignUpCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly sessions: SessionService,
  ) {}

  async execute(cmd: SignUpCommand) {
    const email = cmd.email.trim().toLowerCase();
    const passwordHash = await hashPassword(cmd.password);
    const [row] = await this.db
      .insert(users)
      .values({ email, displayName: cmd.displayName.trim(), passwordHash, role: 'racer' })
      .onConflictDoNothing({ target: users.email })
      .returning();
    if (!row) {
      // Sign-up necessarily tells that an address is taken; sign-in and reset never do.
      throw new FieldsBadRequest({ email: ['an account with this e-mail already exists: sign in instead'] });
    }
    const { token, expiresAt } = await this.sessions.create(row.id);
    return { user: toUserDto(row), token, expiresAt };
  }
}

