import { Command } from '@nestjs/cqrs';
import type { UserDto } from '@fuelwright/shared';

export class SignInCommand extends Command<{ user: UserDto; token: string; expiresAt: Date }> {
  constructor(
    public readonly email: string,
    public readonly password: string,
  ) {
    super();
  }
}
