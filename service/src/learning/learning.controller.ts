import { Body, Controller, Get, HttpCode, Post, Query as QueryParams, Res } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiTags } from '@nestjs/swagger';
import { stringify } from 'csv-stringify';
import type { Response } from 'express';
import { and, desc, inArray } from 'drizzle-orm';
import { Inject } from '@nestjs/common';
import { outcomes, users, type Db } from '@fuelwright/db';
import type { CaseOutcomesResponse, InsightsResponse, RulesetsResponse, OutcomeDto, ProposalDto, ProposalListResponse, WorkOrderDto } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import type { SessionUser } from '../common/session-user.js';
import { DiagnosisService } from '../diagnosis/diagnosis.service.js';
import { CreateWorkOrderDto, InsightTableDto, LogOutcomeDto, PeriodDto, PublishDto, StartProposalDto } from './dto/learning.dto.js';
import { LogOutcomeCommand } from './commands/log-outcome.command.js';
import { ListCaseOutcomesQuery } from './queries/list-case-outcomes.query.js';
import { ListProposalsQuery } from './queries/list-proposals.query.js';
import { InsightsService } from './insights.service.js';
import { OutcomeRepository } from './outcome-repository.js';
import { toOutcomeDto } from './outcome-dto.js';
import { ProposalRunner, toProposalDto } from './proposal-runner.js';
import { WorkOrdersService } from './work-orders.service.js';
import { Param } from '@nestjs/common';

@ApiTags('outcomes')
@Controller()
export class LearningController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
    private readonly workOrders: WorkOrdersService,
    private readonly repo: OutcomeRepository,
    private readonly insights: InsightsService,
    private readonly proposals: ProposalRunner,
    private readonly diagnosis: DiagnosisService,
    @Inject(DB) private readonly db: Db,
  ) {}

  @Post('work-orders')
  @Roles('shop')
  createWorkOrder(@CurrentUser() user: SessionUser, @Body() dto: CreateWorkOrderDto): Promise<WorkOrderDto> {
    return this.workOrders.create(user, dto);
  }

  @Get('work-orders')
  @Roles('shop')
  async listWorkOrders(@CurrentUser() user: SessionUser): Promise<{ workOrders: WorkOrderDto[] }> {
    return { workOrders: await this.workOrders.list(user) };
  }

  /** Shops on work orders and shared cases; racers on their own cases. */
  @Post('outcomes')
  logOutcome(@CurrentUser() user: SessionUser, @Body() dto: LogOutcomeDto): Promise<OutcomeDto> {
    return this.commands.execute(new LogOutcomeCommand(user, dto));
  }

  /** What was logged on a case, for whoever may read the case (its owner, a coach or shop it is shared with); 404 for anyone else. */
  @Get('cases/:id/outcomes')
  async caseOutcomes(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string): Promise<CaseOutcomesResponse> {
    return { outcomes: await this.queries.execute(new ListCaseOutcomesQuery(user, id)) };
  }

  /** The newest outcomes (a shop sees its own, an admin all), at most 200: the full set is in the CSV export. */
  @Get('outcomes')
  @Roles('shop', 'admin')
  async listOutcomes(@CurrentUser() user: SessionUser, @QueryParams() q: PeriodDto): Promise<{ outcomes: OutcomeDto[]; total: number }> {
    const f = { ...q, loggedBy: user.role === 'shop' ? user.id : undefined };
    const rows = await this.db
      .select()
      .from(outcomes)
      .where(and(...this.repo.where(f, false)))
      .orderBy(desc(outcomes.at), desc(outcomes.id))
      .limit(200);
    const superseded = new Set(
      rows.length ? (await this.db.select({ id: outcomes.supersedesId }).from(outcomes).where(inArray(outcomes.supersedesId, rows.map((r) => r.id)))).map((r) => r.id) : [],
    );
    const names = await this.names(rows.map((r) => r.loggedBy));
    return { total: await this.repo.count(f), outcomes: rows.map((r) => toOutcomeDto(r, names.get(r.loggedBy ?? '') ?? '', !superseded.has(r.id))) };
  }

  @Get('outcomes.csv')
  @Roles('shop', 'admin')
  async exportOutcomes(@CurrentUser() user: SessionUser, @QueryParams() q: PeriodDto, @Res() res: Response): Promise<void> {
    const f = { ...q, loggedBy: user.role === 'shop' ? user.id : undefined };
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', 'attachment; filename="outcomes.csv"');
    const csv = stringify({ header: true, columns: ['id', 'at', 'ruleset_version', 'case_id', 'work_order_id', 'symptoms', 'opening_top_cause', 'confirmed_causes', 'other_note', 'fix', 'parts', 'labour_minutes', 'still_fixed', 'supersedes_id', 'demo'] });
    csv.pipe(res);
    for await (const r of this.repo.rows(f, false)) {
      const top = [...(r.openingRank as { causes: { id: string; probability: number }[] }).causes].sort((a, b) => b.probability - a.probability)[0];
      const ok = csv.write([r.id, r.at.toISOString(), r.rulesetVersion, r.caseId ?? '', r.workOrderId ?? '', (r.symptoms as { id: string }[]).map((s) => s.id).join(' '), top?.id ?? '', r.confirmedCauses.join(' '), r.otherNote, r.fix, r.parts, r.labourMinutes ?? '', r.stillFixed ?? '', r.supersedesId ?? '', r.demo]);
      if (!ok) await new Promise((resolve) => csv.once('drain', resolve));
    }
    csv.end();
  }

  @Get('insights')
  @Roles('shop', 'admin')
  getInsights(@QueryParams() q: PeriodDto): Promise<InsightsResponse> {
    return this.insights.compute(q);
  }

  @Get('insights.csv')
  @Roles('shop', 'admin')
  async exportInsights(@QueryParams() q: InsightTableDto, @Res() res: Response): Promise<void> {
    const { insights } = await this.insights.compute(q);
    let records: Record<string, unknown>[];
    switch (q.table) {
      case 'pairs':
        records = insights.symptomCausePairs as unknown as Record<string, unknown>[];
        break;
      case 'labour':
        records = insights.labourByCause as unknown as Record<string, unknown>[];
        break;
      case 'wrong-way':
        records = (insights.wrongWayRules as unknown as { rules: Record<string, unknown>[] }).rules ?? [];
        break;
      default:
        records = insights.calibration.bins as unknown as Record<string, unknown>[];
    }
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="insights-${q.table}.csv"`);
    const csv = stringify(records.map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, Array.isArray(v) || (v && typeof v === 'object') ? JSON.stringify(v) : v]))), { header: true });
    csv.pipe(res);
  }

  @Get('rulesets')
  @Roles('shop', 'admin')
  async rulesets(): Promise<RulesetsResponse> {
    return { active: this.diagnosis.currentVersion, versions: await this.diagnosis.versions() };
  }

  @Post('rulesets/proposals')
  @Roles('shop', 'admin')
  startProposal(@CurrentUser() user: SessionUser, @Body() dto: StartProposalDto): Promise<ProposalDto> {
    return this.proposals.start(user.id, dto);
  }

  /** The newest proposals first, without their diffs (open one for that). */
  @Get('rulesets/proposals')
  @Roles('shop', 'admin')
  async listProposals(): Promise<ProposalListResponse> {
    return { proposals: await this.queries.execute(new ListProposalsQuery()) };
  }

  @Get('rulesets/proposals/:id')
  @Roles('shop', 'admin')
  async proposal(@UuidParam('id', 'proposal') id: string): Promise<ProposalDto> {
    return toProposalDto(await this.proposals.get(id));
  }

  @Post('rulesets/proposals/:id/publish')
  @Roles('admin')
  @HttpCode(200)
  publish(@CurrentUser() user: SessionUser, @UuidParam('id', 'proposal') id: string, @Body() dto: PublishDto): Promise<ProposalDto> {
    return this.proposals.publish(id, user.id, dto.notes ?? '');
  }

  /** Roll back (or forward) to a published version; nothing is deleted. */
  @Post('rulesets/:version/activate')
  @Roles('admin')
  @HttpCode(200)
  async activate(@Param('version') version: string): Promise<{ active: string }> {
    await this.diagnosis.activate(version);
    return { active: this.diagnosis.currentVersion };
  }

  private async names(ids: (string | null)[]): Promise<Map<string, string>> {
    const list = [...new Set(ids.filter((x): x is string => Boolean(x)))];
    if (!list.length) return new Map();
    const rows = await this.db.select({ id: users.id, name: users.displayName }).from(users).where(inArray(users.id, list));
    return new Map(rows.map((r) => [r.id, r.name]));
  }
}

