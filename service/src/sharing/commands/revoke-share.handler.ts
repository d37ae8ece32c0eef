import { Inject, NotFoundException } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { and, eq } from 'drizzle-orm';
import { shares, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { selectShares } from '../share-row.js';
import { RevokeShareCommand } from './revoke-share.command.js';

/** Ends a share at once (every access check reads the shares table); an unused invitation dies with it. */
@CommandHandler(RevokeShareCommand)
export class RevokeShareHandler implements ICommandHandler<RevokeShareCommand> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ user, shareId }: RevokeShareCommand) {
    const [row] = await this.db
      .update(shares)
      .set({ revokedAt: new Date() })
      .where(and(eq(shares.id, shareId), eq(shares.ownerId, user.id)))
      .returning({ id: shares.id });
    if (!row) throw new NotFoundException('No such share.');
    return (await selectShares(this.db, eq(shares.id, shareId)))[0];
  }
}
