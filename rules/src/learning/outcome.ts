/**
 * Outcome records: what really fixed a kart, as plain data. The service stores them, the
 * insights and the refinement read them; nothing here does I/O.
 */
import {
  SOMETHING_ELSE_ID,
  type DiagnosisConditions,
  type RankRequest,
  type RankResponse,
  type SetupSnapshot,
  type SymptomReport,
} from '@fuelwright/shared';

/** One hypothesis and its probability in a ranking. `id` is a catalog cause id or `something-else`. */
export interface RankingEntry {
  id: string;
  probability: number;
}

/** The ranking shown when the case was opened, as the outcome keeps it. */
export interface OpeningRank {
  /**
   * Causes with their probabilities, and `something-else` with its own. Entries may be left out
   * (a cause excluded for the carburettor kind, or one below a display threshold): the metrics
   * take a missing entry as probability 0.
   */
  causes: RankingEntry[];
  /** Names of the rules that fired at case open (likelihood rules; stop rules cannot fire without check results). */
  firedRules: string[];
}

/** What was really wrong with a kart, logged by a shop or the racer. Never edited: a correction is a new record. */
export interface OutcomeRecord {
  id: string;
  /** The shared case it closes; absent for a walk-in whose symptoms were entered on the spot. */
  caseId?: string;
  /** Ruleset version the opening ranking was made with. */
  rulesetVersion: string;
  symptoms: SymptomReport[];
  setup?: SetupSnapshot;
  conditions?: DiagnosisConditions;
  /** Engine displacement, cc (some rules apply only near 80 cc). */
  engineDisplacementCc?: number;
  /** Kart the outcome is about (an id or a name; informational). */
  kart?: string;
  openingRank?: OpeningRank;
  /** Catalog cause ids, or `something-else`. Several when more than one fault was found. */
  confirmedCauses: string[];
  labourMinutes?: number;
  /** Still fixed after the next session? `null` or absent: not followed up yet. */
  stillFixed?: boolean | null;
  /** When the outcome was logged (ISO 8601). */
  at: string;
  /** Set on invented demo data. */
  demo?: boolean;
}

export { SOMETHING_ELSE_ID };

/**
 * The confirmed causes as weights that sum to 1 (each of m distinct causes gets 1/m), keeping
 * only ids `known` accepts. Empty when none is known.
 */
export function confirmedWeights(confirmed: readonly string[], known?: (id: string) => boolean): Map<string, number> {
  const ids = [...new Set(confirmed)].filter((id) => (known ? known(id) : true));
  const out = new Map<string, number>();
  for (const id of ids) out.set(id, 1 / ids.length);
  return out;
}

/** Entries by probability, highest first; ties keep their order in the list. */
export function sortRanking(entries: readonly RankingEntry[]): RankingEntry[] {
  // Array.prototype.sort is stable (ECMAScript 2019), so equal probabilities keep their order.
  return entries.slice().sort((x, y) => y.probability - x.probability);
}

/** The date part (`YYYY-MM-DD`) of an ISO timestamp, when it has one. */
function isoDate(at: string): string | undefined {
  const m = /^(\d{4}-\d{2}-\d{2})/.exec(at);
  return m ? m[1] : undefined;
}

/**
 * The rank request that reproduces the outcome's opening ranking: its symptoms, setup,
 * conditions and displacement, no check results, as of the outcome's date (for foam and rebuild
 * ages).
 */
export function outcomeToRankRequest(outcome: OutcomeRecord): RankRequest {
  const req: RankRequest = { symptoms: outcome.symptoms.map((s) => ({ ...s })) };
  if (outcome.setup) req.setup = { ...outcome.setup };
  if (outcome.conditions) req.conditions = structuredClone(outcome.conditions);
  if (outcome.engineDisplacementCc !== undefined) req.engineDisplacementCc = outcome.engineDisplacementCc;
  const asOf = isoDate(outcome.at);
  if (asOf) req.asOf = asOf;
  return req;
}

/** A rank response as ranking entries (causes and `something-else`). */
export function rankingFromResponse(response: RankResponse): RankingEntry[] {
  return [...response.causes.map((c) => ({ id: c.id, probability: c.probability })), { id: SOMETHING_ELSE_ID, probability: response.somethingElse.probability }];
}

/** The opening rank to store with an outcome, from the rank response and the fired rules at case open. */
export function openingRankFromResponse(response: RankResponse, firedRules: readonly string[]): OpeningRank {
  return { causes: rankingFromResponse(response), firedRules: [...firedRules] };
}
