import { Inject, NotFoundException } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { and, eq } from 'drizzle-orm';
import { jettingSessions, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../../karts/kart-row.js';
import { DeleteSessionCommand } from './delete-session.command.js';

/** Sessions are not edited in place: a wrong one is deleted and logged again. */
@CommandHandler(DeleteSessionCommand)
export class DeleteSessionHandler implements ICommandHandler<DeleteSessionCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, sessionId }: DeleteSessionCommand) {
    this.access.require(user, await findKart(this.db, kartId), 'edit', 'kart');
    const deleted = await this.db
      .delete(jettingSessions)
      .where(and(eq(jettingSessions.id, sessionId), eq(jettingSessions.kartId, kartId)))
      .returning({ id: jettingSessions.id });
    if (deleted.length === 0) throw new NotFoundException('No such session.');
  }
}
