import { Module } from '@nestjs/common';
import { CasesModule } from '../cases/cases.module.js';
import { DiagnosisModule } from '../diagnosis/diagnosis.module.js';
import { LearningController } from './learning.controller.js';
import { LogOutcomeHandler } from './commands/log-outcome.handler.js';
import { InsightsService } from './insights.service.js';
import { OutcomeRepository } from './outcome-repository.js';
import { ProposalRunner } from './proposal-runner.js';
import { WorkOrdersService } from './work-orders.service.js';

@Module({
  imports: [CasesModule, DiagnosisModule],
  controllers: [LearningController],
  providers: [LogOutcomeHandler, OutcomeRepository, InsightsService, ProposalRunner, WorkOrdersService],
  exports: [OutcomeRepository, ProposalRunner],
})
export class LearningModule {}
