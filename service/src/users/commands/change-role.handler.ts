import { BadRequestException, Inject, NotFoundException } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { toUserDto } from '../../auth/user-dto.js';
import { ChangeRoleCommand } from './change-role.command.js';

@CommandHandler(ChangeRoleCommand)
export class ChangeRoleHandler implements ICommandHandler<ChangeRoleCommand> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute(cmd: ChangeRoleCommand) {
    if (cmd.actorId === cmd.userId) {
      // An admin demoting themselves could leave nobody able to manage roles.
      throw new BadRequestException({ message: 'You cannot change your own role; ask another admin.', fields: { role: ['you cannot change your own role'] } });
    }
    const [row] = await this.db
      .update(users)
      .set({ role: cmd.role, updatedAt: new Date() })
      .where(eq(users.id, cmd.userId))
      .returning();
    if (!row) throw new NotFoundException('No such user.');
    return toUserDto(row);
  }
}
