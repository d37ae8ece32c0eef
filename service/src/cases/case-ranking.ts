import { Injectable } from '@nestjs/common';
import type { CheckResultValue, DiagnosisConditions, RankRequest, RankResponse, SetupSnapshot, SymptomReport } from '@fuelwright/shared';
import { DiagnosisPort } from '../diagnosis/diagnosis.port.js';
import { FieldsBadRequest } from '../common/validation.js';

export interface CaseFacts {
  symptoms: SymptomReport[];
  setup: SetupSnapshot;
  conditions: DiagnosisConditions;
  results: Record<string, CheckResultValue>;
  displacementCc: number;
}

/** Builds the rank request of a case and ranks it under the case's ruleset version. */
@Injectable()
export class CaseRanking {
  constructor(private readonly diagnosis: DiagnosisPort) {}

  get currentVersion(): string {
    return this.diagnosis.currentVersion;
  }

  request(f: CaseFacts): RankRequest {
    return {
      symptoms: f.symptoms,
      setup: f.setup,
      conditions: f.conditions,
      results: f.results,
      engineDisplacementCc: f.displacementCc,
      asOf: new Date().toISOString().slice(0, 10),
    };
  }

  /** 400 naming every unknown id; nothing is written when this throws. */
  assertKnown(request: RankRequest, version: string): void {
    const fields = this.diagnosis.unknownIds(request, version);
    if (Object.keys(fields).length > 0) throw new FieldsBadRequest(fields);
  }

  async rank(f: CaseFacts, version: string): Promise<RankResponse> {
    const request = this.request(f);
    this.assertKnown(request, version);
    return this.diagnosis.rank(request, version);
  }

  isKnownCause(causeId: string, version: string): boolean {
    return this.diagnosis.catalog(version).causes.some((c) => c.id === causeId);
  }

  causeLabel(causeId: string, version: string): string | undefined {
    return this.diagnosis.catalog(version).causes.find((c) => c.id === causeId)?.label;
  }

  checkLabel(checkId: string, version: string): string | undefined {
    return this.diagnosis.catalog(version).checks.find((c) => c.id === checkId)?.label;
  }
}
