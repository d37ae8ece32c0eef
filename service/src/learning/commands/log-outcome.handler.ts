import { Inject, NotFoundException } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { and, eq } from 'drizzle-orm';
import { outcomes, workOrders, type Db } from '@fuelwright/db';
import { openingRankFromResponse } from '@fuelwright/rules';
import { SOMETHING_ELSE_ID, type RankRequest, type SetupSnapshot, type SymptomReport } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { CaseStore } from '../../cases/case-store.js';
import { DiagnosisService } from '../../diagnosis/diagnosis.service.js';
import { toOutcomeDto } from '../outcome-dto.js';
import { LogOutcomeCommand } from './log-outcome.command.js';

/**
 * Logs what really fixed a kart: on a case (its owner, or a shop it is shared with) or on a shop's
 * work order. The opening ranking is stored with it (for a case, the one the racer was shown;
 * for a walk-in, ranked now) so accuracy is measured against it. Corrections are new entries.
 */
@CommandHandler(LogOutcomeCommand)
export class LogOutcomeHandler implements ICommandHandler<LogOutcomeCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
    private readonly cases: CaseStore,
    private readonly diagnosis: DiagnosisService,
  ) {}

  async execute({ user, input }: LogOutcomeCommand) {
    if (Boolean(input.caseId) === Boolean(input.workOrderId)) {
      throw new FieldsBadRequest({ caseId: ['give either caseId (a case) or workOrderId (a walk-in work order)'] });
    }
    let version: string;
    let symptoms: SymptomReport[];
    let setup: SetupSnapshot;
    let request: RankRequest;
    let kartId: string | null = null;
    let opening;
    if (input.caseId) {
      const c = await this.cases.load(input.caseId);
      await this.access.requireCase(user, c && { ownerId: c.row.ownerId }, { caseId: input.caseId, kartId: c?.row.kartId ?? '' }, 'log-outcome');
      const p = c!.projection;
      version = c!.row.rulesetVersion;
      symptoms = p.symptoms;
      setup = p.setup;
      kartId = c!.row.kartId;
      request = { symptoms, setup, conditions: p.conditions, engineDisplacementCc: c!.kartDisplacementCc, asOf: c!.row.openedAt.toISOString().slice(0, 10) };
      opening = openingRankFromResponse(p.openingRank, await this.diagnosis.engine(version).firedRules(request));
    } else {
      const [wo] = await this.db.select().from(workOrders).where(and(eq(workOrders.id, input.workOrderId!), eq(workOrders.shopId, user.id)));
      if (!wo) throw new NotFoundException('No such work order.');
      version = this.diagnosis.currentVersion;
      symptoms = wo.symptoms as SymptomReport[];
      setup = wo.setup as SetupSnapshot;
      request = { symptoms, setup };
      const engine = this.diagnosis.engine(version);
      opening = openingRankFromResponse(await engine.rank(request), await engine.firedRules(request));
    }
    const known = new Set(this.diagnosis.catalog(version).causes.map((c) => c.id));
    const unknown = input.confirmedCauses.filter((id) => id !== SOMETHING_ELSE_ID && !known.has(id));
    if (unknown.length) throw new FieldsBadRequest({ confirmedCauses: [`unknown cause ${unknown.map((u) => `"${u}"`).join(', ')}: pick from the catalog, or ${SOMETHING_ELSE_ID}`] });
    if (input.confirmedCauses.includes(SOMETHING_ELSE_ID) && !input.otherNote?.trim()) {
      throw new FieldsBadRequest({ otherNote: ['otherNote must say what it was when the cause is something else'] });
    }
    if (input.supersedesId) {
      const [prev] = await this.db.select().from(outcomes).where(eq(outcomes.id, input.supersedesId));
      const sameItem = prev && (input.caseId ? prev.caseId === input.caseId : prev.workOrderId === input.workOrderId);
      if (!sameItem) throw new FieldsBadRequest({ supersedesId: ['supersedesId must be an earlier outcome of the same case or work order'] });
    }
    const [row] = await this.db
      .insert(outcomes)
      .values({
        caseId: input.caseId ?? null,
        workOrderId: input.workOrderId ?? null,
        kartId,
        loggedBy: user.id,
        rulesetVersion: version,
        symptoms,
        setup,
        openingRank: opening,
        confirmedCauses: [...new Set(input.confirmedCauses)],
        otherNote: input.otherNote?.trim() ?? '',
        fix: input.fix,
        parts: input.parts ?? '',
        labourMinutes: input.labourMinutes ?? null,
        stillFixed: input.stillFixed ?? null,
        supersedesId: input.supersedesId ?? null,
      })
      .returning();
    if (input.workOrderId) await this.db.update(workOrders).set({ status: 'done' }).where(eq(workOrders.id, input.workOrderId));
    return toOutcomeDto(row, user.displayName, true);
  }
}
