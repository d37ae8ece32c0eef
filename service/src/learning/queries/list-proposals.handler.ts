import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { desc, eq, getTableColumns, sql } from 'drizzle-orm';
import { proposals, users, type Db } from '@fuelwright/db';
import { PROPOSAL_LIST_LIMIT, type BackTestFigures, type ProposalSummaryDto } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { toProposalDto } from '../proposal-runner.js';
import { ListProposalsQuery } from './list-proposals.query.js';

/** The part of a stored back-test the list shows (rules/src/learning/refine.ts, BackTest). */
interface StoredBackTest {
  heldOut: number;
  scored: number;
  before: StoredAccuracy;
  after: StoredAccuracy;
}
interface StoredAccuracy {
  top1Rate: number;
  top3Rate: number;
  /** NaN when nothing was ranked, which JSON stores as null. */
  brier: number | null;
}

const figures = (a: StoredAccuracy): BackTestFigures => ({
  top1Rate: a.top1Rate,
  top3Rate: a.top3Rate,
  brier: typeof a.brier === 'number' && Number.isFinite(a.brier) ? a.brier : null,
});

@QueryHandler(ListProposalsQuery)
export class ListProposalsHandler implements IQueryHandler<ListProposalsQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute(): Promise<ProposalSummaryDto[]> {
    // The stored result holds the whole diff and the proposed ruleset: read only its back-test.
    const { result: _result, ...columns } = getTableColumns(proposals);
    const rows = await this.db
      .select({ p: columns, backTest: sql<StoredBackTest | null>`${proposals.result} -> 'backTest'`, createdByName: users.displayName })
      .from(proposals)
      .leftJoin(users, eq(users.id, proposals.createdBy))
      .orderBy(desc(proposals.createdAt), desc(proposals.id))
      .limit(PROPOSAL_LIST_LIMIT);
    return rows.map(({ p, backTest, createdByName }) => {
      const { result: _none, ...dto } = toProposalDto({ ...p, result: null }, false);
      return {
        ...dto,
        createdByName,
        backTest: backTest?.before && backTest.after ? { heldOut: backTest.heldOut, scored: backTest.scored, before: figures(backTest.before), after: figures(backTest.after) } : null,
      };
    });
  }
}
