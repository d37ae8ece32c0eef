import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { caseEvents, cases, karts, users, type CaseRow, type Db } from '@fuelwright/db';
import type { CaseDto, CaseEventDto, CaseSummaryDto, RankResponse, RecommendationDto } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { applyEvent, CaseEventError, replay, type CaseEvent, type CaseProjection } from './case-projection.js';
import { summarizeEvent } from './case-timeline.js';

export type NewCaseEvent = Omit<CaseEvent, 'at' | 'actorId'>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** A case row joined with its kart and owner names. */
export interface LoadedCase {
  row: CaseRow;
  kartName: string;
  ownerName: string;
  kartDisplacementCc: number;
  projection: CaseProjection;
}

/**
 * Appends events and keeps the `cases` projection in step, in one transaction. Appending checks the
 * revision the caller read, so two people recording at once cannot silently overwrite each other.
 */
@Injectable()
export class CaseStore {
  constructor(@Inject(DB) private readonly db: Db) {}

  async load(caseId: string): Promise<LoadedCase | undefined> {
    const [r] = await this.db
      .select({ row: cases, kartName: karts.name, ownerName: users.displayName, kartDisplacementCc: karts.displacementCc })
      .from(cases)
      .innerJoin(karts, eq(karts.id, cases.kartId))
      .innerJoin(users, eq(users.id, cases.ownerId))
      .where(eq(cases.id, caseId))
      .limit(1);
    if (!r) return undefined;
    return { ...r, projection: r.row.snapshot as CaseProjection };
  }

  /** Opens a case: its first event(s) and its row. Returns the new id. */
  async open(ownerId: string, actorId: string, events: NewCaseEvent[]): Promise<string> {
    const now = new Date();
    const stamped = events.map((e) => ({ ...e, at: now, actorId }) as CaseEvent);
    const projection = replay(stamped);
    return this.db.transaction(async (tx) => {
      const [row] = await tx
        .insert(cases)
        .values({ ownerId, ...this.columns(projection), snapshot: projection, revision: stamped.length, openedAt: now, updatedAt: now })
        .returning({ id: cases.id });
      await tx.insert(caseEvents).values(stamped.map((e, i) => ({ caseId: row.id, seq: i + 1, type: e.type, payload: e.payload, actorId, at: now })));
      return row.id;
    });
  }

  /** Appends events to a loaded case; 409 when someone else appended in between. */
  async append(loaded: LoadedCase, actorId: string, events: NewCaseEvent[], alsoInTx?: (tx: Tx) => Promise<void>): Promise<void> {
    const now = new Date();
    let projection = loaded.projection;
    const stamped = events.map((e) => ({ ...e, at: now, actorId }) as CaseEvent);
    try {
      for (const e of stamped) projection = applyEvent(projection, e);
    } catch (err) {
      if (err instanceof CaseEventError) throw new ConflictException(`This case cannot take that step: ${err.message}.`);
      throw err;
    }
    const rev = loaded.row.revision;
    await this.db.transaction(async (tx) => {
      const updated = await tx
        .update(cases)
        .set({ ...this.columns(projection), snapshot: projection, revision: rev + stamped.length, updatedAt: now })
        .where(and(eq(cases.id, loaded.row.id), eq(cases.revision, rev)))
        .returning({ id: cases.id });
      if (updated.length === 0) throw new ConflictException('The case changed while you were working on it. Reload it and try again.');
      await tx.insert(caseEvents).values(stamped.map((e, i) => ({ caseId: loaded.row.id, seq: rev + i + 1, type: e.type, payload: e.payload, actorId, at: now })));
      // Whatever must stand or fall with the step (its e-mail notices) is written in the same transaction.
      if (alsoInTx) await alsoInTx(tx);
    });
  }

  private columns(p: CaseProjection) {
    const top = p.rank.causes[0];
    return {
      kartId: p.kartId,
      state: p.state,
      rulesetVersion: p.rulesetVersion,
      symptomIds: p.symptoms.map((s) => s.id),
      topCauseId: top?.id ?? null,
      topCauseProbability: top?.probability ?? null,
    };
  }

  async events(caseId: string): Promise<CaseEventDto[]> {
    const rows = await this.db
      .select({ e: caseEvents, actorName: users.displayName })
      .from(caseEvents)
      .leftJoin(users, eq(users.id, caseEvents.actorId))
      .where(eq(caseEvents.caseId, caseId))
      .orderBy(asc(caseEvents.seq));
    return rows.map(({ e, actorName }) => {
      const ev = { type: e.type, payload: e.payload, at: e.at, actorId: e.actorId } as CaseEvent;
      const rank = 'rank' in (e.payload as object) ? (e.payload as { rank: CaseProjection['rank'] }).rank : undefined;
      const { rank: _omit, ...payload } = e.payload as Record<string, unknown>;
      return {
        seq: e.seq,
        type: e.type,
        at: e.at.toISOString(),
        actorId: e.actorId,
        actorName: actorName ?? 'A removed account',
        summary: summarizeEvent(ev),
        payload,
        topCauses: rank?.causes.slice(0, 3).map((c) => ({ id: c.id, probability: c.probability })),
      };
    });
  }

  summary(l: LoadedCase): CaseSummaryDto {
    const r = l.row;
    return {
      id: r.id,
      kartId: r.kartId,
      kartName: l.kartName,
      ownerId: r.ownerId,
      ownerName: l.ownerName,
      state: r.state,
      rulesetVersion: r.rulesetVersion,
      symptomIds: r.symptomIds,
      topCauseId: r.topCauseId,
      topCauseProbability: r.topCauseProbability,
      openedAt: r.openedAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    };
  }

  /** Recommendations with names; pending ones (no result yet) lead the plan, marked as coming from the coach or shop. */
  private async recommendations(p: CaseProjection): Promise<{ list: RecommendationDto[]; rank: RankResponse }> {
    const recs = p.recommendations ?? [];
    if (recs.length === 0) return { list: [], rank: p.rank };
    const ids = [...new Set(recs.map((r) => r.by).filter(Boolean))];
    const names = new Map(
      ids.length ? (await this.db.select({ id: users.id, name: users.displayName }).from(users).where(inArray(users.id, ids))).map((u) => [u.id, u.name]) : [],
    );
    const done = new Set(p.results.map((r) => r.checkId));
    const list = recs.map((r) => ({ ...r, byName: names.get(r.by) ?? 'A removed account', pending: !done.has(r.checkId) }));
    const pending = list.filter((r) => r.pending).reverse(); // newest recommendation first
    const plan = [...p.rank.plan];
    const top = [];
    for (const r of pending) {
      const i = plan.findIndex((step) => step.checkId === r.checkId);
      if (i >= 0) top.push({ ...plan.splice(i, 1)[0], recommendation: { by: r.by, byName: r.byName, reason: r.reason } });
    }
    return { list, rank: { ...p.rank, plan: [...top, ...plan] } };
  }

  async dto(l: LoadedCase): Promise<CaseDto> {
    const p = l.projection;
    const recs = await this.recommendations(p);
    return {
      ...this.summary(l),
      symptoms: p.symptoms,
      setup: p.setup,
      conditions: p.conditions,
      results: p.results,
      rank: recs.rank,
      openingRank: p.openingRank,
      resolution: p.resolution,
      stop: p.stop,
      abandonedReason: p.abandonedReason,
      recommendations: recs.list,
      events: await this.events(l.row.id),
    };
  }

  async mustLoad(caseId: string): Promise<LoadedCase> {
    const l = await this.load(caseId);
    if (!l) throw new NotFoundException('No such case.');
    return l;
  }
}

