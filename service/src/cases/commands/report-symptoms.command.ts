import { Command } from '@nestjs/cqrs';
import type { CaseDto, SymptomReport } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class ReportSymptomsCommand extends Command<CaseDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly symptoms: SymptomReport[],
  ) {
    super();
  }
}
