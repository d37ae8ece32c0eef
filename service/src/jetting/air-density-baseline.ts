import { Inject, Injectable } from '@nestjs/common';
import type { Db } from '@fuelwright/db';
import { densityChangePct } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { newestRightSessionRow } from './session-row.js';

export interface AirDensityBaselineDay {
  sessionId: string;
  sessionOn: string;
  densityKgM3: number;
}

/**
 * The air the kart was last jetted right in, for the diagnosis: the change in air density since
 * then is the fact `air-density-changed` (conditions.densityChangePct of the rank request).
 * It does not check access: the caller has already loaded the kart through the AccessPolicy.
 */
@Injectable()
export class AirDensityBaseline {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** The newest session of the kart that ran right, or null when there is none. */
  async baselineOf(kartId: string): Promise<AirDensityBaselineDay | null> {
    const row = await newestRightSessionRow(this.db, kartId);
    return row ? { sessionId: row.id, sessionOn: row.sessionOn, densityKgM3: row.densityKgM3 } : null;
  }

  /**
   * Percent change of air density from the newest session that ran right to today
   * (positive = denser today, the mixture leans); null when no session ran right yet.
   */
  async densityChangeSince(kartId: string, todayDensityKgM3: number): Promise<number | null> {
    const baseline = await this.baselineOf(kartId);
    return baseline ? densityChangePct(baseline.densityKgM3, todayDensityKgM3) : null;
  }
}
