import type { CatalogResponse, RankRequest, RankResponse } from '@fuelwright/shared';

/** What the rest of the service needs from the ranking engine (implemented by DiagnosisService). */
export abstract class DiagnosisPort {
  /** The ruleset version new cases are ranked with. */
  abstract get currentVersion(): string;
  abstract catalog(version?: string): CatalogResponse;
  /** Ranks under the given ruleset version (the current one when absent). */
  abstract rank(request: RankRequest, version?: string): Promise<RankResponse>;
  /**
   * Ids the request names that the ruleset does not know, as 400 `fields`
   * (e.g. `{ "symptoms[1].id": ["unknown symptom \"bogs\""] }`); empty when all are known.
   */
  abstract unknownIds(request: RankRequest, version?: string): Record<string, string[]>;
}
