import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { karts, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../../karts/kart-row.js';
import { loadJetKit } from '../session-row.js';
import { SaveJetKitCommand } from './save-jet-kit.command.js';

@CommandHandler(SaveJetKitCommand)
export class SaveJetKitHandler implements ICommandHandler<SaveJetKitCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, jetKit }: SaveJetKitCommand) {
    this.access.require(user, await findKart(this.db, kartId), 'edit', 'kart');
    await this.db.update(karts).set({ jetKit, updatedAt: new Date() }).where(eq(karts.id, kartId));
    return loadJetKit(this.db, kartId);
  }
}
