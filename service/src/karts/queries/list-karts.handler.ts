import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { asc, eq } from 'drizzle-orm';
import { karts, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { selectKarts, toKartDto } from '../kart-row.js';
import { ListKartsQuery } from './list-karts.query.js';

/** The user's own karts (karts shared with a coach or shop join this list when sharing lands). */
@QueryHandler(ListKartsQuery)
export class ListKartsHandler implements IQueryHandler<ListKartsQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ user }: ListKartsQuery) {
    const rows = await selectKarts(this.db).where(eq(karts.ownerId, user.id)).orderBy(asc(karts.name));
    return rows.map(toKartDto);
  }
}
