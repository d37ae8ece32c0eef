import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import { buildDiagnosisEngine, loadRuleset, type DiagnosisEngine } from '@fuelwright/rules';
import type { CatalogResponse, RankRequest, RankResponse } from '@fuelwright/shared';
import { FieldsBadRequest } from '../common/validation.js';
import { DiagnosisPort } from './diagnosis.port.js';

/**
 * Holds one built engine per ruleset version, each built once and reused for every request.
 * The shipped ruleset is validated at start-up: a bad rule file stops the service with the file,
 * the rule and the field named.
 */
@Injectable()
export class DiagnosisService extends DiagnosisPort {
  private readonly log = new Logger('Diagnosis');
  private readonly engines = new Map<string, DiagnosisEngine>();
  private current: string;

  constructor() {
    super();
    const engine = buildDiagnosisEngine(loadRuleset());
    this.engines.set(engine.version, engine);
    this.current = engine.version;
    this.log.log(`Ruleset ${engine.version}: ${engine.ruleset.rules.length} rules over ${engine.catalog.causes.length} causes`);
  }

  get currentVersion(): string {
    return this.current;
  }

  engine(version: string = this.current): DiagnosisEngine {
    const e = this.engines.get(version);
    if (!e) throw new NotFoundException(`No ruleset version "${version}".`);
    return e;
  }

  catalog(version?: string): CatalogResponse {
    return this.engine(version).catalog;
  }

  unknownIds(request: RankRequest, version?: string): Record<string, string[]> {
    const v = this.engine(version).validateRankRequest(request);
    return v.ok ? {} : v.fields;
  }

  /** Validates (400 naming each field or unknown id) and ranks. */
  async rank(request: unknown, version?: string): Promise<RankResponse> {
    const engine = this.engine(version);
    const v = engine.validateRankRequest(request);
    if (!v.ok) throw new FieldsBadRequest(v.fields, v.message);
    return engine.rank(request as RankRequest);
  }
}
