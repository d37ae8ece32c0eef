import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseStore } from '../case-store.js';
import { loadForStep } from '../case-step.js';
import { ResolveCaseCommand } from './resolve-case.command.js';

@CommandHandler(ResolveCaseCommand)
export class ResolveCaseHandler implements ICommandHandler<ResolveCaseCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
  ) {}

  async execute({ user, caseId, input }: ResolveCaseCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'resolved');
    if (input.causeId !== SOMETHING_ELSE_ID && !this.ranking.isKnownCause(input.causeId, l.row.rulesetVersion)) {
      throw new FieldsBadRequest({ causeId: [`unknown cause "${input.causeId}": pick one from the catalog, or ${SOMETHING_ELSE_ID}`] });
    }
    await this.store.append(l, user.id, [{ type: 'resolved', payload: { causeId: input.causeId, fix: input.fix.trim(), note: input.note?.trim() ?? '' } }]);
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
