import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { asc, eq } from 'drizzle-orm';
import { comments, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { ReviewContext } from '../review-context.js';
import { ListCommentsQuery } from './review.queries.js';

@QueryHandler(ListCommentsQuery)
export class ListCommentsHandler implements IQueryHandler<ListCommentsQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly review: ReviewContext,
  ) {}

  async execute({ user, caseId }: ListCommentsQuery) {
    const part = await this.review.partsOn(await this.review.load(user, caseId, 'view'));
    const rows = await this.db
      .select({ c: comments, name: users.displayName, role: users.role })
      .from(comments)
      .leftJoin(users, eq(users.id, comments.authorId))
      .where(eq(comments.caseId, caseId))
      .orderBy(asc(comments.createdAt));
    return rows.map(({ c, name, role }) => ({
      id: c.id,
      caseId,
      authorId: c.authorId,
      authorName: name ?? 'A removed account',
      authorRole: part(c.authorId, role ?? null),
      body: c.body,
      createdAt: c.createdAt.toISOString(),
    }));
  }
}
