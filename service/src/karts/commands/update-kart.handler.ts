import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { karts, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart, toKartDto } from '../kart-row.js';
import { UpdateKartCommand } from './update-kart.command.js';

@CommandHandler(UpdateKartCommand)
export class UpdateKartHandler implements ICommandHandler<UpdateKartCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, changes }: UpdateKartCommand) {
    this.access.require(user, await findKart(this.db, kartId), 'edit', 'kart');
    const set = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined));
    await this.db.update(karts).set({ ...set, updatedAt: new Date() }).where(eq(karts.id, kartId));
    return toKartDto((await findKart(this.db, kartId))!);
  }
}
