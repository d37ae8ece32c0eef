import { Body, Controller, Get, HttpCode, Post, Put, Query as QueryParams } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiTags } from '@nestjs/swagger';
import type { CaseDto, CaseListResponse } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import type { SessionUser } from '../common/session-user.js';
import { AbandonCaseDto, CorrectCaseFactsDto, OpenCaseDto, RecordCheckResultDto, ReportSymptomsDto, ResolveCaseDto } from './dto/case.dto.js';
import { ListCasesDto } from './dto/list-cases.dto.js';
import { AbandonCaseCommand } from './commands/abandon-case.command.js';
import { CorrectCaseFactsCommand } from './commands/correct-case-facts.command.js';
import { OpenCaseCommand } from './commands/open-case.command.js';
import { RecordCheckResultCommand } from './commands/record-check-result.command.js';
import { ReportSymptomsCommand } from './commands/report-symptoms.command.js';
import { ResolveCaseCommand } from './commands/resolve-case.command.js';
import { GetCaseQuery } from './queries/get-case.query.js';
import { ListCasesQuery } from './queries/list-cases.query.js';

@ApiTags('cases')
@Controller('cases')
export class CasesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get()
  async list(@CurrentUser() user: SessionUser, @QueryParams() q: ListCasesDto): Promise<CaseListResponse> {
    return { cases: await this.queries.execute(new ListCasesQuery(user, q)) };
  }

  @Post()
  open(@CurrentUser() user: SessionUser, @Body() dto: OpenCaseDto): Promise<CaseDto> {
    return this.commands.execute(new OpenCaseCommand(user, dto));
  }

  @Get(':id')
  get(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string): Promise<CaseDto> {
    return this.queries.execute(new GetCaseQuery(user, id));
  }

  @Put(':id/symptoms')
  reportSymptoms(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: ReportSymptomsDto): Promise<CaseDto> {
    return this.commands.execute(new ReportSymptomsCommand(user, id, dto.symptoms));
  }

  /** Corrects the setup and/or the day's air of an open case; ranks again. */
  @Put(':id/facts')
  correctFacts(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: CorrectCaseFactsDto): Promise<CaseDto> {
    return this.commands.execute(new CorrectCaseFactsCommand(user, id, dto));
  }

  @Post(':id/results')
  @HttpCode(200)
  recordResult(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: RecordCheckResultDto): Promise<CaseDto> {
    return this.commands.execute(new RecordCheckResultCommand(user, id, dto));
  }

  @Post(':id/resolve')
  @HttpCode(200)
  resolve(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: ResolveCaseDto): Promise<CaseDto> {
    return this.commands.execute(new ResolveCaseCommand(user, id, dto));
  }

  @Post(':id/abandon')
  @HttpCode(200)
  abandon(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: AbandonCaseDto): Promise<CaseDto> {
    return this.commands.execute(new AbandonCaseCommand(user, id, dto.reason ?? ''));
  }
}
