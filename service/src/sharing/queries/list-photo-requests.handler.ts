import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { asc, eq } from 'drizzle-orm';
import { photoRequests, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { ReviewContext } from '../review-context.js';
import { ListPhotoRequestsQuery } from './review.queries.js';

@QueryHandler(ListPhotoRequestsQuery)
export class ListPhotoRequestsHandler implements IQueryHandler<ListPhotoRequestsQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly review: ReviewContext,
  ) {}

  async execute({ user, caseId }: ListPhotoRequestsQuery) {
    await this.review.load(user, caseId, 'view');
    const rows = await this.db
      .select({ r: photoRequests, name: users.displayName })
      .from(photoRequests)
      .leftJoin(users, eq(users.id, photoRequests.requestedBy))
      .where(eq(photoRequests.caseId, caseId))
      .orderBy(asc(photoRequests.createdAt));
    return rows.map(({ r, name }) => ({
      id: r.id,
      caseId,
      what: r.what,
      checkId: r.checkId,
      requestedBy: r.requestedBy,
      requestedByName: name ?? 'A removed account',
      fulfilledByPhotoId: r.fulfilledByPhotoId,
      createdAt: r.createdAt.toISOString(),
    }));
  }
}
