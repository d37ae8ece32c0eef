import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import type { Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { readStoredPreferences, toUserPreferences } from '../preferences-row.js';
import { GetPreferencesQuery } from './get-preferences.query.js';

@QueryHandler(GetPreferencesQuery)
export class GetPreferencesHandler implements IQueryHandler<GetPreferencesQuery> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ userId }: GetPreferencesQuery) {
    return toUserPreferences(await readStoredPreferences(this.db, userId));
  }
}
