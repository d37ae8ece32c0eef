import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { desc, eq, sql } from 'drizzle-orm';
import { outcomes, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseStore } from '../../cases/case-store.js';
import { toOutcomeDto } from '../outcome-dto.js';
import { ListCaseOutcomesQuery } from './list-case-outcomes.query.js';

/**
 * Every entry logged on a case, newest first, with who logged it, whether it is the reader's own,
 * and whether a later entry corrects it. Whoever may view the case reads them (its owner, a coach or shop it is shared
 * with); anyone else gets 404, as for the case itself.
 */
@QueryHandler(ListCaseOutcomesQuery)
export class ListCaseOutcomesHandler implements IQueryHandler<ListCaseOutcomesQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, caseId }: ListCaseOutcomesQuery) {
    const loaded = await this.store.load(caseId);
    await this.access.requireCase(user, loaded && { ownerId: loaded.row.ownerId }, { caseId, kartId: loaded?.row.kartId ?? '' }, 'view');
    const rows = await this.db
      .select({
        o: outcomes,
        loggedByName: users.displayName,
        current: sql<boolean>`not exists (select 1 from "outcomes" o2 where o2."supersedes_id" = "outcomes"."id")`,
      })
      .from(outcomes)
      .leftJoin(users, eq(users.id, outcomes.loggedBy))
      .where(eq(outcomes.caseId, caseId))
      .orderBy(desc(outcomes.at), desc(outcomes.id));
    return rows.map((r) => ({ ...toOutcomeDto(r.o, r.loggedByName ?? '', r.current), yours: r.o.loggedBy === user.id }));
  }
}
