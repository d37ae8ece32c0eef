import { Module } from '@nestjs/common';
import { DiagnosisController } from './diagnosis.controller.js';
import { DiagnosisPort } from './diagnosis.port.js';
import { DiagnosisService } from './diagnosis.service.js';

@Module({
  controllers: [DiagnosisController],
  providers: [DiagnosisService, { provide: DiagnosisPort, useExisting: DiagnosisService }],
  exports: [DiagnosisPort, DiagnosisService],
})
export class DiagnosisModule {}
