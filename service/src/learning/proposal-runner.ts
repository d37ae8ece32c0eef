import { Inject, Injectable, Logger, NotFoundException, ConflictException } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import { proposals, type Db, type ProposalRow } from '@fuelwright/db';
import { proposeRuleset, validateRuleset, type RulesetSource } from '@fuelwright/rules';
import type { ProposalDto, ProposalResult, StartProposalRequest } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { FieldsBadRequest } from '../common/validation.js';
import { DiagnosisService } from '../diagnosis/diagnosis.service.js';
import { OutcomeRepository } from './outcome-repository.js';

export function toProposalDto(r: ProposalRow, withResult = true): ProposalDto {
  const result = r.result as Record<string, unknown> | null;
  let shown: ProposalResult | null = null;
  if (withResult && result) {
    const { source: _source, ...rest } = result;
    shown = rest as unknown as ProposalResult;
  }
  return {
    id: r.id,
    baseVersion: r.baseVersion,
    proposedVersion: r.proposedVersion,
    strength: r.strength,
    seed: r.seed,
    holdOutFraction: r.holdOutFraction,
    status: r.status,
    progress: r.progress,
    error: r.error,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt?.toISOString() ?? null,
    result: shown,
  };
}

/**
 * Runs a refinement in the background of the service process: reads the outcomes a batch at a
 * time, fits, back-tests on the held-out ones, and writes its progress to the proposal row, which
 * the UI polls for its progress bar.
 */
@Injectable()
export class ProposalRunner {
  private readonly log = new Logger('Refinement');
  private readonly running = new Map<string, Promise<void>>();

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly diagnosis: DiagnosisService,
    private readonly outcomes: OutcomeRepository,
  ) {}

  async start(userId: string, req: StartProposalRequest): Promise<ProposalDto> {
    if (this.running.size > 0) throw new ConflictException('A refinement is already running; wait for it to finish.');
    if ((await this.diagnosis.versions()).some((v) => v.version === req.version)) {
      throw new FieldsBadRequest({ version: [`version ${req.version} is already published: pick a new one`] });
    }
    const base = this.diagnosis.currentVersion;
    const [row] = await this.db
      .insert(proposals)
      .values({ baseVersion: base, proposedVersion: req.version, strength: req.strength, seed: req.seed ?? 1, holdOutFraction: req.holdOutFraction ?? 0.2, createdBy: userId })
      .returning();
    const job = this.run(row).finally(() => this.running.delete(row.id));
    this.running.set(row.id, job);
    return toProposalDto(row);
  }

  /** Resolves when the proposal's job is done (tests and the bench wait on it). */
  async wait(id: string): Promise<void> {
    await this.running.get(id);
  }

  private async run(row: ProposalRow): Promise<void> {
    const started = Date.now();
    try {
      const total = await this.outcomes.count({});
      let lastWritten = 0;
      const proposal = await proposeRuleset(this.diagnosis.engine(row.baseVersion).ruleset, this.outcomes.records({}), {
        version: row.proposedVersion,
        strength: row.strength,
        seed: row.seed,
        holdOutFraction: row.holdOutFraction,
        total,
        onProgress: async (f) => {
          if (f - lastWritten >= 0.05 || f === 1) {
            lastWritten = f;
            await this.db.update(proposals).set({ progress: Math.min(f, 0.999) }).where(eq(proposals.id, row.id));
          }
          await new Promise((r) => setImmediate(r));
        },
      });
      const { ruleset: _r, ...result } = proposal;
      // All but the source is what the proposal page reads: the shared wire type, checked here.
      const { source: _source, ...shown } = result;
      shown satisfies ProposalResult;
      await this.db
        .update(proposals)
        .set({ status: 'ready', progress: 1, result: JSON.parse(JSON.stringify(result)), finishedAt: new Date() })
        .where(eq(proposals.id, row.id));
      this.log.log(`Proposal ${row.proposedVersion} from ${total} outcomes ready in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    } catch (e) {
      this.log.error(e instanceof Error ? e.stack ?? e.message : String(e));
      await this.db
        .update(proposals)
        .set({ status: 'failed', error: e instanceof Error ? e.message : String(e), finishedAt: new Date() })
        .where(eq(proposals.id, row.id));
    }
  }

  async get(id: string): Promise<ProposalRow> {
    const [row] = await this.db.select().from(proposals).where(eq(proposals.id, id));
    if (!row) throw new NotFoundException('No such proposal.');
    return row;
  }

  /** Admin only (checked by the route): stores the proposal as a new immutable version and activates it. */
  async publish(id: string, userId: string, notes: string): Promise<ProposalDto> {
    const row = await this.get(id);
    if (row.status !== 'ready') throw new ConflictException(`This proposal is ${row.status}; only a ready one can be published.`);
    const source = (row.result as { source: RulesetSource }).source;
    const ruleset = validateRuleset(source);
    await this.diagnosis.publish(ruleset, row.baseVersion, userId, notes || `Re-fitted from outcomes (strength ${row.strength})`);
    const [updated] = await this.db.update(proposals).set({ status: 'published' }).where(eq(proposals.id, id)).returning();
    return toProposalDto(updated);
  }
}
