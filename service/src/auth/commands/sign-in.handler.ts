import { Inject, UnauthorizedException } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { SIGN_IN_FAILED_MESSAGE } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { dummyHash, verifyPassword } from '../password.js';
import { SessionService } from '../session.service.js';
import { toUserDto } from '../user-dto.js';
import { SignInCommand } from './sign-in.command.js';

@CommandHandler(SignInCommand)
export class SignInHandler implements ICommandHandler<SignInCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly sessions: SessionService,
  ) {}

  async execute(cmd: SignInCommand) {
    const email = cmd.email.trim().toLowerCase();
    const [row] = await this.db.select().from(users).where(eq(users.email, email)).limit(1);
    // Unknown e-mail and wrong password: same work, same answer (no account enumeration).
    const ok = await verifyPassword(row?.passwordHash ?? (await dummyHash()), cmd.password);
    if (!row || !ok) throw new UnauthorizedException(SIGN_IN_FAILED_MESSAGE);
    const { token, expiresAt } = await this.sessions.create(row.id);
    return { user: toUserDto(row), token, expiresAt };
  }
}
