import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { SetupSnapshot } from '@fuelwright/shared';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { AirDensityBaseline } from '../../jetting/air-density-baseline.js';
import { withDensityChange } from '../case-conditions.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseProgressNotices, progressLine } from '../case-progress-notices.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { factsOf, loadForStep } from '../case-step.js';
import { CorrectCaseFactsCommand } from './correct-case-facts.command.js';

/**
 * Corrects an open case's setup and/or conditions and ranks again with the results so far, under
 * the case's own ruleset version. The opening ranking stays as it was (outcomes are measured
 * against what the racer was first shown); the timeline keeps both.
 */
@CommandHandler(CorrectCaseFactsCommand)
export class CorrectCaseFactsHandler implements ICommandHandler<CorrectCaseFactsCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
    private readonly airBaseline: AirDensityBaseline,
    private readonly progress: CaseProgressNotices,
  ) {}

  async execute({ user, caseId, input }: CorrectCaseFactsCommand) {
    if (input.setup === undefined && input.conditions === undefined) {
      throw new FieldsBadRequest({ setup: ['give the corrected setup, the conditions, or both'] });
    }
    const l = await loadForStep(this.store, this.access, user, caseId, 'facts-corrected');
    const facts = factsOf(l);
    // The carburettor kind is the kart's, whatever the correction says.
    const setup: SetupSnapshot = input.setup ? { ...input.setup, carburettorKind: l.projection.setup.carburettorKind } : facts.setup;
    const conditions = input.conditions ? await withDensityChange(this.airBaseline, l.row.kartId, input.conditions) : facts.conditions;
    const rank = await this.ranking.rank({ ...facts, setup, conditions }, l.row.rulesetVersion);
    const events: NewCaseEvent[] = [{ type: 'facts-corrected', payload: { setup, conditions, rank } }];
    if (rank.stop) events.push({ type: 'stopped', payload: { stop: rank.stop } });
    const to = await this.progress.recipients(l, user);
    const what = input.setup && input.conditions ? 'Setup and air corrected' : input.setup ? 'Setup corrected' : 'Air corrected';
    const line = progressLine(what, rank);
    await this.store.append(l, user.id, events, (tx) => this.progress.queue(tx, l, user, to, line, Boolean(rank.stop)));
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
