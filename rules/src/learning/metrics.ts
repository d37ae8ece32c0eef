/**
 * How good the ranking was: incremental accumulators over outcome records. Each one takes one
 * outcome (or one ranking) at a time with `add` and holds only counters, so 50,000 outcomes can
 * be streamed through in bounded memory; `result()` may be called at any time.
 *
 * Definitions (see README.md in this folder):
 * - The hypotheses are the catalog causes and `something-else`; a ranking lists them with their
 *   probabilities, and a hypothesis it leaves out counts as probability 0.
 * - An outcome with m distinct confirmed causes gives each of them the target weight 1/m (the
 *   ranking assumes one fault, so the targets sum to 1 like the probabilities).
 * - Top-k: the ranking's k most probable hypotheses (ties in list order) contain a confirmed one.
 *   `something-else` is ranked like any cause.
 * - Brier score (Brier 1950, multi-category form): sum over hypotheses of (p - y)^2, from 0
 *   (certain and right) to 2 (certain and wrong); the mean over outcomes is reported.
 * - Calibration: every (outcome, hypothesis) pair the ranking lists, binned by its predicted
 *   probability into equal-width bins, against the mean target in the bin (the observed
 *   frequency); and the same for the top hypothesis only ("top-label" calibration).
 */
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';
import type { Ruleset } from '../model.js';
import { confirmedWeights, sortRanking, type OutcomeRecord, type RankingEntry } from './outcome.js';

/** True when one of the k most probable hypotheses is a confirmed one. */
export function topKHit(ranking: readonly RankingEntry[], confirmed: ReadonlySet<string> | readonly string[], k: number): boolean {
  const set = confirmed instanceof Set ? confirmed : new Set(confirmed as readonly string[]);
  const sorted = sortRanking(ranking);
  for (let i = 0; i < Math.min(k, sorted.length); i++) if (set.has(sorted[i].id)) return true;
  return false;
}

const listed = (ranking: readonly RankingEntry[], id: string): boolean => {
  for (const e of ranking) if (e.id === id) return true;
  return false;
};

/**
 * Multi-category Brier score of one ranking (distinct ids, as the engine gives them) against
 * target weights (hypothesis id -> weight, summing to 1).
 */
export function brierScore(ranking: readonly RankingEntry[], targets: ReadonlyMap<string, number>): number {
  let sum = 0;
  for (const e of ranking) {
    const d = e.probability - (targets.get(e.id) ?? 0);
    sum += d * d;
  }
  for (const [id, y] of targets) if (!listed(ranking, id)) sum += y * y;
  return sum;
}

export interface RankingAccuracy {
  /** Rankings scored. */
  ranked: number;
  top1: number;
  top3: number;
  /** Shares of `ranked` (0 when nothing was ranked). */
  top1Rate: number;
  top3Rate: number;
  /** Mean multi-category Brier score (NaN when nothing was ranked). */
  brier: number;
}

export interface AccuracyState {
  n: number;
  hits1: number;
  hits3: number;
  brierSum: number;
}

/** Top-1, top-3 and Brier score over rankings. */
export class AccuracyAccumulator {
  private n = 0;
  private hits1 = 0;
  private hits3 = 0;
  private brierSum = 0;

  add(ranking: readonly RankingEntry[], targets: ReadonlyMap<string, number>): void {
    this.addSorted(sortRanking(ranking), targets);
  }

  /** The same, for a ranking already sorted by `sortRanking`. */
  addSorted(sorted: readonly RankingEntry[], targets: ReadonlyMap<string, number>): void {
    this.n++;
    if (sorted.length > 0 && targets.has(sorted[0].id)) this.hits1++;
    for (let i = 0; i < Math.min(3, sorted.length); i++) {
      if (targets.has(sorted[i].id)) {
        this.hits3++;
        break;
      }
    }
    this.brierSum += brierScore(sorted, targets);
  }

  /** The counters as plain JSON (for a stored roll-up). */
  state(): AccuracyState {
    return { n: this.n, hits1: this.hits1, hits3: this.hits3, brierSum: this.brierSum };
  }

  /** Adds the counters of another accumulator's `state()`. */
  merge(s: AccuracyState): void {
    this.n += s.n;
    this.hits1 += s.hits1;
    this.hits3 += s.hits3;
    this.brierSum += s.brierSum;
  }

  result(): RankingAccuracy {
    const n = this.n;
    return { ranked: n, top1: this.hits1, top3: this.hits3, top1Rate: n ? this.hits1 / n : 0, top3Rate: n ? this.hits3 / n : 0, brier: n ? this.brierSum / n : NaN };
  }
}

export interface CalibrationBin {
  /** Predicted-probability range [from, to) (the last bin includes 1). */
  from: number;
  to: number;
  /** Predictions in the bin. */
  count: number;
  /** Mean predicted probability in the bin (NaN when empty). */
  meanPredicted: number;
  /** Mean target (observed frequency) in the bin (NaN when empty). */
  observed: number;
}

export interface Calibration {
  bins: CalibrationBin[];
  /** Predictions binned. */
  count: number;
  /** Expected calibration error: sum over bins of count/total * |meanPredicted - observed|. */
  expectedCalibrationError: number;
}

/** Index of the equal-width bin holding probability p (p = 1 goes in the last bin). */
export function calibrationBinIndex(p: number, bins: number): number {
  if (!(p > 0)) return 0;
  return Math.min(bins - 1, Math.floor(p * bins));
}

/** Per bin: predictions, and the sums of their predicted and observed values. */
export interface CalibrationState {
  count: number[];
  sumP: number[];
  sumY: number[];
}

/** Reliability bins: predicted probability against observed frequency. */
export class CalibrationAccumulator {
  private readonly count: Float64Array;
  private readonly sumP: Float64Array;
  private readonly sumY: Float64Array;

  constructor(readonly bins = 10) {
    if (!Number.isInteger(bins) || bins < 1) throw new RangeError(`bins must be a positive integer (got ${bins})`);
    this.count = new Float64Array(bins);
    this.sumP = new Float64Array(bins);
    this.sumY = new Float64Array(bins);
  }

  /** One prediction: probability p of a hypothesis whose target (observed) value is y (0..1). */
  addPrediction(p: number, y: number): void {
    const i = calibrationBinIndex(p, this.bins);
    this.count[i]++;
    this.sumP[i] += p;
    this.sumY[i] += y;
  }

  /** Every hypothesis a ranking (distinct ids) lists, plus any confirmed hypothesis it leaves out (at p = 0). */
  addRanking(ranking: readonly RankingEntry[], targets: ReadonlyMap<string, number>): void {
    for (const e of ranking) this.addPrediction(e.probability, targets.get(e.id) ?? 0);
    for (const [id, y] of targets) if (!listed(ranking, id)) this.addPrediction(0, y);
  }

  state(): CalibrationState {
    return { count: [...this.count], sumP: [...this.sumP], sumY: [...this.sumY] };
  }

  merge(s: CalibrationState): void {
    if (s.count.length !== this.bins) throw new RangeError(`cannot merge ${s.count.length} calibration bins into ${this.bins}`);
    for (let i = 0; i < this.bins; i++) {
      this.count[i] += s.count[i];
      this.sumP[i] += s.sumP[i];
      this.sumY[i] += s.sumY[i];
    }
  }

  result(): Calibration {
    let total = 0;
    for (let i = 0; i < this.bins; i++) total += this.count[i];
    let ece = 0;
    const bins: CalibrationBin[] = [];
    for (let i = 0; i < this.bins; i++) {
      const n = this.count[i];
      const meanPredicted = n ? this.sumP[i] / n : NaN;
      const observed = n ? this.sumY[i] / n : NaN;
      if (n) ece += (n / total) * Math.abs(meanPredicted - observed);
      bins.push({ from: i / this.bins, to: (i + 1) / this.bins, count: n, meanPredicted, observed });
    }
    return { bins, count: total, expectedCalibrationError: total ? ece : NaN };
  }
}

export interface SymptomCausePair {
  symptom: string;
  cause: string;
  /** Outcomes that reported the symptom and confirmed the cause. */
  outcomes: number;
  /** Share of the outcomes reporting the symptom that confirmed this cause. */
  shareOfSymptom: number;
}

export type SymptomCauseState = Record<string, { total: number; causes: Record<string, number> }>;

/** How often each reported symptom went with each confirmed cause. */
export class SymptomCauseAccumulator {
  private readonly pairs = new Map<string, Map<string, number>>();
  private readonly bySymptom = new Map<string, number>();

  add(symptoms: readonly string[], confirmed: readonly string[]): void {
    const causes = [...new Set(confirmed)];
    for (const s of new Set(symptoms)) {
      this.bySymptom.set(s, (this.bySymptom.get(s) ?? 0) + 1);
      let row = this.pairs.get(s);
      if (!row) this.pairs.set(s, (row = new Map()));
      for (const c of causes) row.set(c, (row.get(c) ?? 0) + 1);
    }
  }

  /** symptom -> { total: outcomes reporting it, causes: cause -> outcomes }. */
  state(): SymptomCauseState {
    const out: SymptomCauseState = {};
    for (const [symptom, row] of this.pairs) out[symptom] = { total: this.bySymptom.get(symptom)!, causes: Object.fromEntries(row) };
    return out;
  }

  merge(s: SymptomCauseState): void {
    for (const [symptom, { total, causes }] of Object.entries(s)) {
      this.bySymptom.set(symptom, (this.bySymptom.get(symptom) ?? 0) + total);
      let row = this.pairs.get(symptom);
      if (!row) this.pairs.set(symptom, (row = new Map()));
      for (const [c, n] of Object.entries(causes)) row.set(c, (row.get(c) ?? 0) + n);
    }
  }

  /** The `limit` most frequent pairs (ties by symptom, then cause id). */
  result(limit = 20): SymptomCausePair[] {
    const out: SymptomCausePair[] = [];
    for (const [symptom, row] of this.pairs) {
      const total = this.bySymptom.get(symptom)!;
      for (const [cause, n] of row) out.push({ symptom, cause, outcomes: n, shareOfSymptom: n / total });
    }
    out.sort((a, b) => b.outcomes - a.outcomes || (a.symptom < b.symptom ? -1 : a.symptom > b.symptom ? 1 : a.cause < b.cause ? -1 : a.cause > b.cause ? 1 : 0));
    return out.slice(0, limit);
  }
}

export interface LabourByCause {
  cause: string;
  /** Outcomes with labour minutes that confirmed the cause. */
  outcomes: number;
  meanMinutes: number;
  /** Sample standard deviation (NaN for a single outcome). */
  sdMinutes: number;
  minMinutes: number;
  maxMinutes: number;
}

/** Per cause: count, running mean, sum of squared deviations (Welford's M2), min and max. */
export type LabourState = Record<string, { n: number; mean: number; m2: number; min: number; max: number }>;

/** Mean labour minutes per confirmed cause (Welford's running mean and variance). */
export class LabourAccumulator {
  private readonly stats = new Map<string, { n: number; mean: number; m2: number; min: number; max: number }>();

  add(confirmed: readonly string[], minutes: number | undefined): void {
    if (typeof minutes !== 'number' || !Number.isFinite(minutes) || minutes < 0) return;
    for (const c of new Set(confirmed)) {
      let s = this.stats.get(c);
      if (!s) this.stats.set(c, (s = { n: 0, mean: 0, m2: 0, min: Infinity, max: -Infinity }));
      s.n++;
      const d = minutes - s.mean;
      s.mean += d / s.n;
      s.m2 += d * (minutes - s.mean);
      s.min = Math.min(s.min, minutes);
      s.max = Math.max(s.max, minutes);
    }
  }

  state(): LabourState {
    const out: LabourState = {};
    for (const [c, s] of this.stats) out[c] = { n: s.n, mean: s.mean, m2: s.m2, min: s.min, max: s.max };
    return out;
  }

  /**
   * Combines another accumulator's running mean and variance with these (Chan, Golub and LeVeque
   * 1979, the pairwise update): n = na + nb, d = mean_b - mean_a, mean = mean_a + d nb / n,
   * M2 = M2_a + M2_b + d^2 na nb / n.
   */
  merge(other: LabourState): void {
    for (const [c, b] of Object.entries(other)) {
      if (!b.n) continue;
      const a = this.stats.get(c);
      if (!a) {
        this.stats.set(c, { ...b });
        continue;
      }
      const n = a.n + b.n;
      const d = b.mean - a.mean;
      a.mean += (d * b.n) / n;
      a.m2 += b.m2 + (d * d * a.n * b.n) / n;
      a.n = n;
      a.min = Math.min(a.min, b.min);
      a.max = Math.max(a.max, b.max);
    }
  }

  /** Causes with the most outcomes first. */
  result(): LabourByCause[] {
    return [...this.stats.entries()]
      .map(([cause, s]) => ({ cause, outcomes: s.n, meanMinutes: s.mean, sdMinutes: s.n > 1 ? Math.sqrt(s.m2 / (s.n - 1)) : NaN, minMinutes: s.min, maxMinutes: s.max }))
      .sort((a, b) => b.outcomes - a.outcomes || (a.cause < b.cause ? -1 : 1));
  }
}

export interface WrongWayRule {
  rule: string;
  cause: string;
  lr: number;
  /** `for`: the rule raises its cause (LR > 1); `against`: it lowers it. */
  direction: 'for' | 'against';
  /** Outcomes where it fired (and its cause could occur on the kart). */
  fired: number;
  /** Of those, the outcomes where it pointed the wrong way. */
  wrongWay: number;
  wrongWayRate: number;
}

export interface WrongWayRules {
  rules: WrongWayRule[];
  /** Fired rule names the ruleset does not know (renamed or from another version). */
  unknownRuleFirings: number;
}

export interface WrongWayState {
  rules: Record<string, [fired: number, wrongWay: number]>;
  unknown: number;
}

/**
 * Rules that fired and pointed the wrong way: a rule for a cause (LR > 1) in an outcome that did
 * not confirm it, or a rule against a cause (LR < 1) in an outcome that did. Firings for a cause
 * that cannot occur on the kart's carburettor kind are not counted (the ranking ignored them).
 */
export class WrongWayRulesAccumulator {
  private readonly byName = new Map<string, { cause: string; lr: number; kinds?: readonly string[]; fired: number; wrong: number; seenAt: number }>();
  private readonly stopRules = new Set<string>();
  private unknown = 0;
  private calls = 0;

  constructor(ruleset: Ruleset) {
    const kinds = new Map(ruleset.catalog.causes.map((c) => [c.id, c.carburettorKinds]));
    for (const r of ruleset.rules) {
      if (r.event.type !== 'likelihood') {
        this.stopRules.add(r.name);
        continue;
      }
      this.byName.set(r.name, { cause: r.event.params.cause, lr: r.event.params.lr, kinds: kinds.get(r.event.params.cause), fired: 0, wrong: 0, seenAt: -1 });
    }
  }

  add(firedRules: readonly string[], confirmed: ReadonlySet<string>, carburettorKind?: string): void {
    const call = this.calls++;
    for (const name of firedRules) {
      const r = this.byName.get(name);
      if (!r) {
        // A stop rule never points at a cause; any other name is not in this ruleset.
        if (!this.stopRules.has(name)) this.unknown++;
        continue;
      }
      if (r.seenAt === call) continue; // listed twice
      r.seenAt = call;
      if (carburettorKind && r.kinds && !r.kinds.includes(carburettorKind)) continue;
      r.fired++;
      const isConfirmed = confirmed.has(r.cause);
      if (r.lr > 1 ? !isConfirmed : isConfirmed) r.wrong++;
    }
  }

  /** Rule name -> [fired, wrong way], for the rules that fired; and the unknown firings. */
  state(): WrongWayState {
    const rules: Record<string, [number, number]> = {};
    for (const [name, r] of this.byName) if (r.fired) rules[name] = [r.fired, r.wrong];
    return { rules, unknown: this.unknown };
  }

  /** Adds another accumulator's counts (for the same ruleset; names it does not know count as unknown). */
  merge(s: WrongWayState): void {
    this.unknown += s.unknown;
    for (const [name, [fired, wrong]] of Object.entries(s.rules)) {
      const r = this.byName.get(name);
      if (!r) {
        this.unknown += fired;
        continue;
      }
      r.fired += fired;
      r.wrong += wrong;
    }
  }

  /** The `limit` rules with the most wrong-way firings (ties: higher rate, then name). */
  result(limit = 20): WrongWayRules {
    const rules: WrongWayRule[] = [];
    for (const [rule, r] of this.byName) {
      if (!r.fired) continue;
      rules.push({ rule, cause: r.cause, lr: r.lr, direction: r.lr > 1 ? 'for' : 'against', fired: r.fired, wrongWay: r.wrong, wrongWayRate: r.wrong / r.fired });
    }
    rules.sort((a, b) => b.wrongWay - a.wrongWay || b.wrongWayRate - a.wrongWayRate || (a.rule < b.rule ? -1 : 1));
    return { rules: rules.slice(0, limit), unknownRuleFirings: this.unknown };
  }
}

export interface InsightsOptions {
  /** Calibration bins (default 10). */
  bins?: number;
  /** Symptom-cause pairs to return (default 20). */
  topPairs?: number;
  /** Wrong-way rules to return (default 20). */
  topRules?: number;
}

export interface Insights {
  rulesetVersion: string;
  /** Outcomes added. */
  outcomes: number;
  /** Outcomes left out: no confirmed cause the ruleset knows. */
  skipped: number;
  /** Outcomes linked to a case, and walk-ins. */
  withCase: number;
  walkIns: number;
  /** Outcomes with an opening ranking (the ones the accuracy and calibration figures cover). */
  ranked: number;
  accuracy: RankingAccuracy;
  calibration: Calibration;
  topLabelCalibration: Calibration;
  symptomCausePairs: SymptomCausePair[];
  labourByCause: LabourByCause[];
  wrongWayRules: WrongWayRules;
  /** Confirmations per hypothesis (an outcome with two causes counts for both), most first. */
  confirmed: { cause: string; outcomes: number }[];
  stillFixed: { yes: number; no: number; unknown: number };
}

/** An InsightsAccumulator's counters as plain JSON (see `InsightsAccumulator.state`). */
export interface InsightsState {
  rulesetVersion: string;
  bins: number;
  n: number;
  skipped: number;
  withCase: number;
  ranked: number;
  accuracy: AccuracyState;
  calibration: CalibrationState;
  topLabel: CalibrationState;
  pairs: SymptomCauseState;
  labour: LabourState;
  wrongWay: WrongWayState;
  confirmed: Record<string, number>;
  stillFixed: { yes: number; no: number; unknown: number };
}

/** Every insight figure for one ruleset version, one outcome at a time. */
export class InsightsAccumulator {
  private readonly known: Set<string>;
  private readonly accuracy = new AccuracyAccumulator();
  private readonly calibration: CalibrationAccumulator;
  private readonly topLabel: CalibrationAccumulator;
  private readonly pairs = new SymptomCauseAccumulator();
  private readonly labour = new LabourAccumulator();
  private readonly wrongWay: WrongWayRulesAccumulator;
  private readonly confirmed = new Map<string, number>();
  private readonly still = { yes: 0, no: 0, unknown: 0 };
  private n = 0;
  private skippedN = 0;
  private withCaseN = 0;
  private rankedN = 0;

  constructor(
    private readonly ruleset: Ruleset,
    private readonly options: InsightsOptions = {},
  ) {
    this.known = new Set([...ruleset.catalog.causes.map((c) => c.id), SOMETHING_ELSE_ID]);
    this.calibration = new CalibrationAccumulator(options.bins ?? 10);
    this.topLabel = new CalibrationAccumulator(options.bins ?? 10);
    this.wrongWay = new WrongWayRulesAccumulator(ruleset);
  }

  add(outcome: OutcomeRecord): void {
    this.n++;
    const targets = confirmedWeights(outcome.confirmedCauses, (id) => this.known.has(id));
    if (targets.size === 0) {
      this.skippedN++;
      return;
    }
    const confirmed = [...targets.keys()];
    if (outcome.caseId) this.withCaseN++;
    for (const c of confirmed) this.confirmed.set(c, (this.confirmed.get(c) ?? 0) + 1);
    if (outcome.stillFixed === true) this.still.yes++;
    else if (outcome.stillFixed === false) this.still.no++;
    else this.still.unknown++;
    this.pairs.add(
      outcome.symptoms.map((s) => s.id),
      confirmed,
    );
    this.labour.add(confirmed, outcome.labourMinutes);
    const open = outcome.openingRank;
    if (open && open.causes.length) {
      this.rankedN++;
      const sorted = sortRanking(open.causes);
      this.accuracy.addSorted(sorted, targets);
      this.calibration.addRanking(sorted, targets);
      this.topLabel.addPrediction(sorted[0].probability, targets.has(sorted[0].id) ? 1 : 0);
      this.wrongWay.add(open.firedRules, new Set(confirmed), outcome.setup?.carburettorKind);
    }
  }

  /**
   * Everything added so far as plain JSON: stored per day and per month as roll-ups, and merged
   * back with `merge` (every figure is a sum of per-outcome terms, so the merge of two parts equals
   * one pass over both, up to floating-point rounding).
   */
  state(): InsightsState {
    return {
      rulesetVersion: this.ruleset.version,
      bins: this.calibration.bins,
      n: this.n,
      skipped: this.skippedN,
      withCase: this.withCaseN,
      ranked: this.rankedN,
      accuracy: this.accuracy.state(),
      calibration: this.calibration.state(),
      topLabel: this.topLabel.state(),
      pairs: this.pairs.state(),
      labour: this.labour.state(),
      wrongWay: this.wrongWay.state(),
      confirmed: Object.fromEntries(this.confirmed),
      stillFixed: { ...this.still },
    };
  }

  /** Adds a `state()` taken with the same ruleset version and number of bins. */
  merge(s: InsightsState): void {
    if (s.rulesetVersion !== this.ruleset.version) throw new RangeError(`cannot merge insights of version ${s.rulesetVersion} into ${this.ruleset.version}`);
    this.n += s.n;
    this.skippedN += s.skipped;
    this.withCaseN += s.withCase;
    this.rankedN += s.ranked;
    this.accuracy.merge(s.accuracy);
    this.calibration.merge(s.calibration);
    this.topLabel.merge(s.topLabel);
    this.pairs.merge(s.pairs);
    this.labour.merge(s.labour);
    this.wrongWay.merge(s.wrongWay);
    for (const [c, n] of Object.entries(s.confirmed)) this.confirmed.set(c, (this.confirmed.get(c) ?? 0) + n);
    this.still.yes += s.stillFixed.yes;
    this.still.no += s.stillFixed.no;
    this.still.unknown += s.stillFixed.unknown;
  }

  result(): Insights {
    return {
      rulesetVersion: this.ruleset.version,
      outcomes: this.n,
      skipped: this.skippedN,
      withCase: this.withCaseN,
      walkIns: this.n - this.skippedN - this.withCaseN,
      ranked: this.rankedN,
      accuracy: this.accuracy.result(),
      calibration: this.calibration.result(),
      topLabelCalibration: this.topLabel.result(),
      symptomCausePairs: this.pairs.result(this.options.topPairs ?? 20),
      labourByCause: this.labour.result(),
      wrongWayRules: this.wrongWay.result(this.options.topRules ?? 20),
      confirmed: [...this.confirmed.entries()].map(([cause, outcomes]) => ({ cause, outcomes })).sort((a, b) => b.outcomes - a.outcomes || (a.cause < b.cause ? -1 : 1)),
      stillFixed: { ...this.still },
    };
  }
}

/** Insights over an array or any iterable of outcomes. */
export function computeInsights(ruleset: Ruleset, outcomes: Iterable<OutcomeRecord>, options: InsightsOptions = {}): Insights {
  const acc = new InsightsAccumulator(ruleset, options);
  for (const o of outcomes) acc.add(o);
  return acc.result();
}
