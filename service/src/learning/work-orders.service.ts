import { Inject, Injectable } from '@nestjs/common';
import { desc, eq, sql } from 'drizzle-orm';
import { workOrders, type Db, type WorkOrderRow } from '@fuelwright/db';
import type { CreateWorkOrderRequest, SetupSnapshot, SymptomReport, WorkOrderDto } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { AccessPolicy } from '../common/access/access-policy.js';
import { FieldsBadRequest } from '../common/validation.js';
import type { SessionUser } from '../common/session-user.js';
import { CaseStore } from '../cases/case-store.js';
import { DiagnosisService } from '../diagnosis/diagnosis.service.js';

const toDto = (r: WorkOrderRow, n: number): WorkOrderDto => ({
  id: r.id,
  caseId: r.caseId,
  customerName: r.customerName,
  kartDescription: r.kartDescription,
  symptoms: r.symptoms as SymptomReport[],
  setup: (r.setup ?? {}) as SetupSnapshot,
  status: r.status,
  notes: r.notes,
  createdAt: r.createdAt.toISOString(),
  outcomes: n,
});

/** A shop's work orders: for a case shared with the shop, or a walk-in entered on the spot. */
@Injectable()
export class WorkOrdersService {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
    private readonly cases: CaseStore,
    private readonly diagnosis: DiagnosisService,
  ) {}

  async create(user: SessionUser, input: CreateWorkOrderRequest): Promise<WorkOrderDto> {
    let values: typeof workOrders.$inferInsert;
    if (input.caseId) {
      const c = await this.cases.load(input.caseId);
      await this.access.requireCase(user, c && { ownerId: c.row.ownerId }, { caseId: input.caseId, kartId: c?.row.kartId ?? '' }, 'log-outcome');
      values = { shopId: user.id, caseId: input.caseId, customerName: c!.ownerName, kartDescription: c!.kartName, symptoms: c!.projection.symptoms, setup: c!.projection.setup, notes: input.notes ?? '' };
    } else {
      const fields: Record<string, string[]> = {};
      if (!input.customerName?.trim()) fields.customerName = ['customerName must name the customer (a walk-in has no case)'];
      const symptoms = (input.symptoms ?? []).map((s) => (typeof s === 'string' ? { id: s } : s)) as SymptomReport[];
      if (symptoms.length === 0) fields.symptoms = ['symptoms must list what the customer noticed'];
      else Object.assign(fields, this.diagnosis.unknownIds({ symptoms, setup: input.setup }));
      if (Object.keys(fields).length) throw new FieldsBadRequest(fields);
      values = { shopId: user.id, customerName: input.customerName!.trim(), kartDescription: input.kartDescription ?? '', symptoms, setup: input.setup ?? {}, notes: input.notes ?? '' };
    }
    const [row] = await this.db.insert(workOrders).values(values).returning();
    return toDto(row, 0);
  }

  async list(user: SessionUser): Promise<WorkOrderDto[]> {
    const rows = await this.db
      .select({ w: workOrders, n: sql<number>`(select count(*)::int from "outcomes" o where o."work_order_id" = "work_orders"."id")` })
      .from(workOrders)
      .where(eq(workOrders.shopId, user.id))
      .orderBy(desc(workOrders.createdAt))
      .limit(500);
    return rows.map((r) => toDto(r.w, r.n));
  }
}
