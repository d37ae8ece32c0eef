import { Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import type { Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../../karts/kart-row.js';
import { loadJetKit } from '../session-row.js';
import { GetJetKitQuery } from './get-jet-kit.query.js';

@QueryHandler(GetJetKitQuery)
export class GetJetKitHandler implements IQueryHandler<GetJetKitQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId }: GetJetKitQuery) {
    await this.access.requireKart(user, await findKart(this.db, kartId), 'view');
    return loadJetKit(this.db, kartId);
  }
}
