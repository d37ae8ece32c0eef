import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import type { Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart, toKartDto } from '../kart-row.js';
import { GetKartQuery } from './get-kart.query.js';

@QueryHandler(GetKartQuery)
export class GetKartHandler implements IQueryHandler<GetKartQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId }: GetKartQuery) {
    return toKartDto(await this.access.requireKart(user, await findKart(this.db, kartId), 'view'));
  }
}
