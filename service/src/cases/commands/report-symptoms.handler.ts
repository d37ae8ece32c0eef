import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseProgressNotices, progressLine } from '../case-progress-notices.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { loadForStep, factsOf } from '../case-step.js';
import { ReportSymptomsCommand } from './report-symptoms.command.js';

@CommandHandler(ReportSymptomsCommand)
export class ReportSymptomsHandler implements ICommandHandler<ReportSymptomsCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
    private readonly progress: CaseProgressNotices,
  ) {}

  async execute({ user, caseId, symptoms }: ReportSymptomsCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'symptoms-reported');
    const rank = await this.ranking.rank({ ...factsOf(l), symptoms }, l.row.rulesetVersion);
    const events: NewCaseEvent[] = [{ type: 'symptoms-reported', payload: { symptoms, rank } }];
    if (rank.stop) events.push({ type: 'stopped', payload: { stop: rank.stop } });
    const to = await this.progress.recipients(l, user);
    const line = progressLine('Symptoms changed', rank);
    await this.store.append(l, user.id, events, (tx) => this.progress.queue(tx, l, user, to, line, Boolean(rank.stop)));
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
