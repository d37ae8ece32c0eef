import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { and, desc, eq, isNull, or, sql } from 'drizzle-orm';
import { cases, karts, shares, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { ListSharedCasesQuery } from './review.queries.js';

/** Cases shared with the user (whatever their role), directly or through their kart: open first, newest change first. */
@QueryHandler(ListSharedCasesQuery)
export class ListSharedCasesHandler implements IQueryHandler<ListSharedCasesQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ user }: ListSharedCasesQuery) {
    const shared = this.db
      .select({ caseId: cases.id })
      .from(cases)
      .innerJoin(
        shares,
        and(
          eq(shares.granteeId, user.id),
          isNull(shares.revokedAt),
          or(and(eq(shares.scope, 'kart'), eq(shares.kartId, cases.kartId)), and(eq(shares.scope, 'case'), eq(shares.caseId, cases.id))),
        ),
      );
    const rows = await this.db
      .select({
        id: cases.id,
        kartId: cases.kartId,
        kartName: karts.name,
        ownerId: cases.ownerId,
        ownerName: users.displayName,
        state: cases.state,
        topCauseId: cases.topCauseId,
        topCauseProbability: cases.topCauseProbability,
        updatedAt: cases.updatedAt,
        openedAt: cases.openedAt,
        comments: sql<number>`(select count(*)::int from "comments" cm where cm."case_id" = "cases"."id")`,
        pendingPhotoRequests: sql<number>`(select count(*)::int from "photo_requests" pr where pr."case_id" = "cases"."id" and pr."fulfilled_by_photo_id" is null)`,
      })
      .from(cases)
      .innerJoin(karts, eq(karts.id, cases.kartId))
      .innerJoin(users, eq(users.id, cases.ownerId))
      .where(sql`${cases.id} in (${shared})`)
      .orderBy(sql`case when ${cases.state} = 'open' then 0 else 1 end`, desc(cases.updatedAt))
      .limit(500);
    return rows.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString(), openedAt: r.openedAt.toISOString() }));
  }
}
