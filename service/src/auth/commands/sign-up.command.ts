import { Command } from '@nestjs/cqrs';
import type { UserDto } from '@fuelwright/shared';

export class SignUpCommand extends Command<{ user: UserDto; token: string; expiresAt: Date; shared?: { caseId: string | null; kartId: string } }> {
  constructor(
    public readonly email: string,
    public readonly password: string,
    public readonly displayName: string,
    public readonly invitationToken?: string,
  ) {
    super();
  }
}
