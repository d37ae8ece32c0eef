import { Command } from '@nestjs/cqrs';
import type { Role, UserDto } from '@fuelwright/shared';

export class ChangeRoleCommand extends Command<UserDto> {
  constructor(
    public readonly actorId: string,
    public readonly userId: string,
    public readonly role: Role,
  ) {
    super();
  }
}
