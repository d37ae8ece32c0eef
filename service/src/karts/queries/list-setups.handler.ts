import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { desc, eq } from 'drizzle-orm';
import { setups, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../kart-row.js';
import { toSetupDtos } from '../setup-row.js';
import { ListSetupsQuery } from './list-setups.query.js';

export function listSetupRows(db: Db, kartId: string) {
  return db.select().from(setups).where(eq(setups.kartId, kartId)).orderBy(desc(setups.takenOn), desc(setups.createdAt));
}

@QueryHandler(ListSetupsQuery)
export class ListSetupsHandler implements IQueryHandler<ListSetupsQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId }: ListSetupsQuery) {
    await this.access.requireKart(user, await findKart(this.db, kartId), 'view');
    return toSetupDtos(await listSetupRows(this.db, kartId));
  }
}
