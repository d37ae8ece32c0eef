import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { and, eq } from 'drizzle-orm';
import { jettingSessions, setups, type Db } from '@fuelwright/db';
import type { AirRequest } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { findKart } from '../../karts/kart-row.js';
import { computeAirOrBadRequest } from '../../conditions/air-input.js';
import { toSessionDto } from '../session-row.js';
import { LogSessionCommand } from './log-session.command.js';

/**
 * Logs a session. The densities are computed here from the air as entered (CIPM-2007) and stored
 * with it, so the log keeps the figures of the day even if the formulas are refined later.
 */
@CommandHandler(LogSessionCommand)
export class LogSessionHandler implements ICommandHandler<LogSessionCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, input }: LogSessionCommand) {
    this.access.require(user, await findKart(this.db, kartId), 'edit', 'kart');
    const air = computeAirOrBadRequest({
      temperatureC: input.temperatureC,
      relativeHumidityPct: input.relativeHumidityPct,
      stationPressureHpa: input.stationPressureHpa,
      altitudeM: input.altitudeM,
      seaLevelPressureHpa: input.seaLevelPressureHpa,
    } as AirRequest);
    if (input.setupId) {
      const [setup] = await this.db
        .select({ id: setups.id })
        .from(setups)
        .where(and(eq(setups.id, input.setupId), eq(setups.kartId, kartId)))
        .limit(1);
      if (!setup) throw new FieldsBadRequest({ setupId: ['setupId must be the id of a setup snapshot of this kart'] });
    }
    const [row] = await this.db
      .insert(jettingSessions)
      .values({
        kartId,
        sessionOn: input.sessionOn,
        track: input.track ?? '',
        temperatureC: input.temperatureC,
        stationPressureHpa: air.stationPressureHpa,
        relativeHumidityPct: input.relativeHumidityPct,
        densityKgM3: air.densityKgM3,
        dryAirDensityKgM3: air.dryAirDensityKgM3,
        setupId: input.setupId ?? null,
        mainJet: input.mainJet,
        pilotJet: input.pilotJet ?? null,
        needleClipGroove: input.needleClipGroove ?? null,
        airScrewTurnsOut: input.airScrewTurnsOut ?? null,
        plugColour: input.plugColour ?? null,
        ran: input.ran,
        lapTimeMs: input.lapTimeMs ?? null,
        note: input.note ?? '',
        createdBy: user.id,
      })
      .returning();
    return toSessionDto(row);
  }
}
