import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { and, desc, eq, type SQL } from 'drizzle-orm';
import { cases, karts, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { CaseStore } from '../case-store.js';
import type { CaseProjection } from '../case-projection.js';
import { ListCasesQuery } from './list-cases.query.js';

/** The user's own cases, newest change first (cases shared with a coach or shop join later). */
@QueryHandler(ListCasesQuery)
export class ListCasesHandler implements IQueryHandler<ListCasesQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly store: CaseStore,
  ) {}

  async execute({ user, filter }: ListCasesQuery) {
    const where: SQL[] = [eq(cases.ownerId, user.id)];
    if (filter.state) where.push(eq(cases.state, filter.state));
    if (filter.kartId) where.push(eq(cases.kartId, filter.kartId));
    const rows = await this.db
      .select({ row: cases, kartName: karts.name, ownerName: users.displayName, kartDisplacementCc: karts.displacementCc })
      .from(cases)
      .innerJoin(karts, eq(karts.id, cases.kartId))
      .innerJoin(users, eq(users.id, cases.ownerId))
      .where(and(...where))
      .orderBy(desc(cases.updatedAt))
      .limit(500);
    return rows.map((r) => this.store.summary({ ...r, projection: r.row.snapshot as CaseProjection }));
  }
}
