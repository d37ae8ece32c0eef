import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseProgressNotices, progressLine } from '../case-progress-notices.js';
import { CaseStore } from '../case-store.js';
import { loadForStep } from '../case-step.js';
import { AbandonCaseCommand } from './abandon-case.command.js';

@CommandHandler(AbandonCaseCommand)
export class AbandonCaseHandler implements ICommandHandler<AbandonCaseCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly progress: CaseProgressNotices,
  ) {}

  async execute({ user, caseId, reason }: AbandonCaseCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'abandoned');
    const to = await this.progress.recipients(l, user);
    const why = reason.trim();
    // Abandoning ranks nothing again: the line gives where the ranking stood when the racer stopped.
    const line = progressLine(`Case abandoned${why ? ` (${why})` : ''}`, { causes: l.projection.rank.causes });
    await this.store.append(l, user.id, [{ type: 'abandoned', payload: { reason: why } }], (tx) => this.progress.queue(tx, l, user, to, line));
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
