import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { loadForStep, factsOf } from '../case-step.js';
import { ReportSymptomsCommand } from './report-symptoms.command.js';

@CommandHandler(ReportSymptomsCommand)
export class ReportSymptomsHandler implements ICommandHandler<ReportSymptomsCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
  ) {}

  async execute({ user, caseId, symptoms }: ReportSymptomsCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'symptoms-reported');
    const rank = await this.ranking.rank({ ...factsOf(l), symptoms }, l.row.rulesetVersion);
    const events: NewCaseEvent[] = [{ type: 'symptoms-reported', payload: { symptoms, rank } }];
    if (rank.stop) events.push({ type: 'stopped', payload: { stop: rank.stop } });
    await this.store.append(l, user.id, events);
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
