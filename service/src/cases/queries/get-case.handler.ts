import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseStore } from '../case-store.js';
import { GetCaseQuery } from './get-case.query.js';

@QueryHandler(GetCaseQuery)
export class GetCaseHandler implements IQueryHandler<GetCaseQuery> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, caseId }: GetCaseQuery) {
    const loaded = await this.store.load(caseId);
    await this.access.requireCase(user, loaded && { ownerId: loaded.row.ownerId }, { caseId, kartId: loaded?.row.kartId ?? '' }, 'view');
    return this.store.dto(loaded!);
  }
}
