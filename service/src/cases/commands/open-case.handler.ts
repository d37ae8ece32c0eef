import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { desc, eq } from 'drizzle-orm';
import { setups, type Db } from '@fuelwright/db';
import { SETUP_FIELDS, type CheckResultValue, type SetupSnapshot } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { findKart } from '../../karts/kart-row.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseStore, type NewCaseEvent } from '../case-store.js';
import { OpenCaseCommand } from './open-case.command.js';
import { AirDensityBaseline } from '../../jetting/air-density-baseline.js';
import { withDensityChange } from '../case-conditions.js';

@CommandHandler(OpenCaseCommand)
export class OpenCaseHandler implements ICommandHandler<OpenCaseCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
    private readonly store: CaseStore,
    private readonly airBaseline: AirDensityBaseline,
  ) {}

  async execute({ user, input }: OpenCaseCommand) {
    // Opening a case changes the kart's record, so it takes 'edit': the owner only. Anyone else
    // (another racer, a coach or shop it is shared with, an admin) gets the policy's 404.
    const kart = await this.access.requireKart(user, await findKart(this.db, input.kartId), 'edit');
    const setup: SetupSnapshot = { ...(input.setup ?? (await this.latestSetup(kart.id))), carburettorKind: kart.carburettorKind };
    const conditions = await withDensityChange(this.airBaseline, kart.id, input.conditions ?? {});
    const symptoms = input.symptoms.map((s) => (typeof s === 'string' ? { id: s } : s));
    const version = this.ranking.currentVersion;

    // Rank every step first: a bad id anywhere refuses the whole request and nothing is written.
    const facts = { symptoms, setup, conditions, results: {} as Record<string, CheckResultValue>, displacementCc: kart.displacementCc };
    const events: NewCaseEvent[] = [
      { type: 'opened', payload: { kartId: kart.id, symptoms, setup, conditions, rulesetVersion: version, rank: await this.ranking.rank(facts, version) } },
    ];
    const seen = new Set<string>();
    for (const [i, r] of (input.results ?? []).entries()) {
      if (seen.has(r.checkId)) throw new FieldsBadRequest({ [`results[${i}].checkId`]: [`check "${r.checkId}" is listed twice`] });
      seen.add(r.checkId);
      facts.results = { ...facts.results, [r.checkId]: r.result };
      const rank = await this.ranking.rank(facts, version);
      events.push({ type: 'check-recorded', payload: { checkId: r.checkId, result: r.result, note: r.note ?? '', rank } });
      if (rank.stop) {
        events.push({ type: 'stopped', payload: { stop: rank.stop } });
        break;
      }
    }
    const id = await this.store.open(user.id, user.id, events);
    return this.store.dto(await this.store.mustLoad(id));
  }

  private async latestSetup(kartId: string): Promise<SetupSnapshot> {
    const [row] = await this.db.select().from(setups).where(eq(setups.kartId, kartId)).orderBy(desc(setups.takenOn), desc(setups.createdAt)).limit(1);
    if (!row) return {};
    return Object.fromEntries(SETUP_FIELDS.filter((f) => f in row && row[f as keyof typeof row] !== null).map((f) => [f, row[f as keyof typeof row]])) as SetupSnapshot;
  }
}
