import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import type { Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../../karts/kart-row.js';
import { listSessionRows, toSessionDto } from '../session-row.js';
import { ListSessionsQuery } from './list-sessions.query.js';

@QueryHandler(ListSessionsQuery)
export class ListSessionsHandler implements IQueryHandler<ListSessionsQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId }: ListSessionsQuery) {
    await this.access.requireKart(user, await findKart(this.db, kartId), 'view');
    return (await listSessionRows(this.db, kartId)).map(toSessionDto);
  }
}
