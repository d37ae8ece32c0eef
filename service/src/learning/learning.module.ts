import { Module } from '@nestjs/common';
import { CasesModule } from '../cases/cases.module.js';
import { DiagnosisModule } from '../diagnosis/diagnosis.module.js';
import { LearningController } from './learning.controller.js';
import { LogOutcomeHandler } from './commands/log-outcome.handler.js';
import { ListCaseOutcomesHandler } from './queries/list-case-outcomes.handler.js';
import { ListProposalsHandler } from './queries/list-proposals.handler.js';
import { InsightsService } from './insights.service.js';
import { OutcomeRepository } from './outcome-repository.js';
import { ProposalRunner } from './proposal-runner.js';
import { WorkOrdersService } from './work-orders.service.js';

const handlers = [LogOutcomeHandler, ListCaseOutcomesHandler, ListProposalsHandler];

@Module({
  imports: [CasesModule, DiagnosisModule],
  controllers: [LearningController],
  providers: [...handlers, OutcomeRepository, InsightsService, ProposalRunner, WorkOrdersService],
  exports: [OutcomeRepository, ProposalRunner],
})
export class LearningModule {}
