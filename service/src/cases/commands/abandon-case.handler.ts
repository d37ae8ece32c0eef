import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseStore } from '../case-store.js';
import { loadForStep } from '../case-step.js';
import { AbandonCaseCommand } from './abandon-case.command.js';

@CommandHandler(AbandonCaseCommand)
export class AbandonCaseHandler implements ICommandHandler<AbandonCaseCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, caseId, reason }: AbandonCaseCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'abandoned');
    await this.store.append(l, user.id, [{ type: 'abandoned', payload: { reason: reason.trim() } }]);
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
