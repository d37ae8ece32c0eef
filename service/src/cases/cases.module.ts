import { Module } from '@nestjs/common';
import { DiagnosisModule } from '../diagnosis/diagnosis.module.js';
import { JettingModule } from '../jetting/jetting.module.js';
import { CasesController } from './cases.controller.js';
import { CaseRanking } from './case-ranking.js';
import { CaseStore } from './case-store.js';
import { CaseAudience } from './case-audience.js';
import { CaseProgressNotices } from './case-progress-notices.js';
import { AbandonCaseHandler } from './commands/abandon-case.handler.js';
import { CorrectCaseFactsHandler } from './commands/correct-case-facts.handler.js';
import { OpenCaseHandler } from './commands/open-case.handler.js';
import { RecordCheckResultHandler } from './commands/record-check-result.handler.js';
import { ReportSymptomsHandler } from './commands/report-symptoms.handler.js';
import { ResolveCaseHandler } from './commands/resolve-case.handler.js';
import { GetCaseHandler } from './queries/get-case.handler.js';
import { ListCasesHandler } from './queries/list-cases.handler.js';

const handlers = [
  OpenCaseHandler,
  ReportSymptomsHandler,
  CorrectCaseFactsHandler,
  RecordCheckResultHandler,
  ResolveCaseHandler,
  AbandonCaseHandler,
  GetCaseHandler,
  ListCasesHandler,
];

@Module({
  imports: [DiagnosisModule, JettingModule],
  controllers: [CasesController],
  providers: [CaseStore, CaseRanking, CaseAudience, CaseProgressNotices, ...handlers],
  exports: [CaseStore, CaseRanking, CaseAudience],
})
export class CasesModule {}
