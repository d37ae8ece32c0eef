import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { asc } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { toUserDto } from '../../auth/user-dto.js';
import { ListUsersQuery } from './list-users.query.js';

@QueryHandler(ListUsersQuery)
export class ListUsersHandler implements IQueryHandler<ListUsersQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute() {
    const rows = await this.db.select().from(users).orderBy(asc(users.email));
    return rows.map(toUserDto);
  }
}
