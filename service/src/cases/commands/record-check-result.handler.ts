import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { CHECK_RESULT_LABELS } from '@fuelwright/shared';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseProgressNotices, progressLine } from '../case-progress-notices.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { loadForStep, factsOf } from '../case-step.js';
import { RecordCheckResultCommand } from './record-check-result.command.js';

@CommandHandler(RecordCheckResultCommand)
export class RecordCheckResultHandler implements ICommandHandler<RecordCheckResultCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
    private readonly progress: CaseProgressNotices,
  ) {}

  async execute({ user, caseId, input }: RecordCheckResultCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'check-recorded');
    const facts = factsOf(l);
    const rank = await this.ranking.rank({ ...facts, results: { ...facts.results, [input.checkId]: input.result } }, l.row.rulesetVersion);
    const events: NewCaseEvent[] = [{ type: 'check-recorded', payload: { checkId: input.checkId, result: input.result, note: input.note ?? '', rank } }];
    if (rank.stop) events.push({ type: 'stopped', payload: { stop: rank.stop } });
    const to = await this.progress.recipients(l, user);
    const check = this.ranking.checkLabel(input.checkId, l.row.rulesetVersion) ?? input.checkId;
    const note = input.note?.trim() ? ` (note: ${input.note.trim()})` : '';
    const line = progressLine(`Recorded: ${check} — ${CHECK_RESULT_LABELS[input.result].toLowerCase()}${note}`, rank);
    await this.store.append(l, user.id, events, (tx) => this.progress.queue(tx, l, user, to, line, Boolean(rank.stop)));
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
