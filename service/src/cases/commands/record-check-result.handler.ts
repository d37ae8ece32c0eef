import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { loadForStep, factsOf } from '../case-step.js';
import { RecordCheckResultCommand } from './record-check-result.command.js';

@CommandHandler(RecordCheckResultCommand)
export class RecordCheckResultHandler implements ICommandHandler<RecordCheckResultCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
  ) {}

  async execute({ user, caseId, input }: RecordCheckResultCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'check-recorded');
    const facts = factsOf(l);
    const rank = await this.ranking.rank({ ...facts, results: { ...facts.results, [input.checkId]: input.result } }, l.row.rulesetVersion);
    const events: NewCaseEvent[] = [{ type: 'check-recorded', payload: { checkId: input.checkId, result: input.result, note: input.note ?? '', rank } }];
    if (rank.stop) events.push({ type: 'stopped', payload: { stop: rank.stop } });
    await this.store.append(l, user.id, events);
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
