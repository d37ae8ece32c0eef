import { ConflictException, Inject } from '@nestjs/common';
import { QueryHandler, type IQueryHandler } from '@nestjs/cqrs';
import type { Db } from '@fuelwright/db';
import { isJetInputError, suggestJets, type AirRequest, type JetSuggestionResponse } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { findKart } from '../../karts/kart-row.js';
import { computeAirOrBadRequest } from '../../conditions/air-input.js';
import { listRightSessionRows, loadJetKit, toSessionDto } from '../session-row.js';
import { SuggestJetsQuery } from './suggest-jets.query.js';

export const NO_BASELINE_MESSAGE =
  'No session of this kart has run right yet. Log a session that ran right (clean pull to the top, good plug colour): the suggestion starts from the jets that ran right and the air they ran in.';

/**
 * Today's jets from the racer's own history: the baseline is the newest session that ran right
 * (or the one chosen), the logged range is every session that ran right. Nothing is stored.
 */
@QueryHandler(SuggestJetsQuery)
export class SuggestJetsHandler implements IQueryHandler<SuggestJetsQuery> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, input }: SuggestJetsQuery): Promise<JetSuggestionResponse> {
    await this.access.requireKart(user, await findKart(this.db, kartId), 'view');
    const air = computeAirOrBadRequest({
      temperatureC: input.temperatureC,
      relativeHumidityPct: input.relativeHumidityPct,
      stationPressureHpa: input.stationPressureHpa,
      altitudeM: input.altitudeM,
      seaLevelPressureHpa: input.seaLevelPressureHpa,
    } as AirRequest);

    const right = await listRightSessionRows(this.db, kartId);
    if (right.length === 0) throw new ConflictException(NO_BASELINE_MESSAGE);
    const baseline = input.baselineSessionId ? right.find((s) => s.id === input.baselineSessionId) : right[right.length - 1];
    if (!baseline) {
      throw new FieldsBadRequest({ baselineSessionId: ['baselineSessionId must be the id of a session of this kart that ran right'] });
    }

    const { jetKit } = await loadJetKit(this.db, kartId);
    try {
      const suggestion = suggestJets({
        baseline: {
          densityKgM3: baseline.densityKgM3,
          dryAirDensityKgM3: baseline.dryAirDensityKgM3,
          mainJet: baseline.mainJet,
          pilotJet: baseline.pilotJet ?? undefined,
          airScrewTurnsOut: baseline.airScrewTurnsOut ?? undefined,
        },
        today: { densityKgM3: air.densityKgM3, dryAirDensityKgM3: air.dryAirDensityKgM3 },
        scaling: jetKit.scaling,
        mainJetSizes: jetKit.main,
        pilotJetSizes: jetKit.pilot,
        history: right.filter((s) => s.id !== baseline.id).map((s) => ({ densityKgM3: s.densityKgM3, date: s.sessionOn })),
      });
      return { air, baseline: toSessionDto(baseline), rightSessions: right.map(toSessionDto), jetKit, suggestion };
    } catch (e) {
      if (isJetInputError(e)) throw new FieldsBadRequest({ [e.field]: [e.message] });
      throw e;
    }
  }
}
