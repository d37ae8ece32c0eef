import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { and, eq, type SQL } from 'drizzle-orm';
import { shares, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { selectShares } from '../share-row.js';
import { ListSharesQuery } from './review.queries.js';

/** The owner's shares (revoked ones too, marked), optionally of one kart or case. */
@QueryHandler(ListSharesQuery)
export class ListSharesHandler implements IQueryHandler<ListSharesQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  execute({ user, filter }: ListSharesQuery) {
    const where: SQL[] = [eq(shares.ownerId, user.id)];
    if (filter.kartId) where.push(eq(shares.kartId, filter.kartId));
    if (filter.caseId) where.push(eq(shares.caseId, filter.caseId));
    return selectShares(this.db, and(...where)!);
  }
}
