import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { karts, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../kart-row.js';
import { DeleteKartCommand } from './delete-kart.command.js';

@CommandHandler(DeleteKartCommand)
export class DeleteKartHandler implements ICommandHandler<DeleteKartCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId }: DeleteKartCommand): Promise<void> {
    this.access.require(user, await findKart(this.db, kartId), 'delete', 'kart');
    await this.db.delete(karts).where(eq(karts.id, kartId));
  }
}
