import { describe, expect, it } from 'vitest';
import type { JettingSessionDto } from '@fuelwright/shared';
import { DENSITY_TICK_STEPS, JET_TICK_STEPS, densityDomain, jetDomain, niceTicks, sessionPoints, suggestionLine } from './chart-data';

const session = (over: Partial<JettingSessionDto>): JettingSessionDto => ({
  id: 'x',
  kartId: 'k',
  sessionOn: '2026-11-01',
  track: '',
  temperatureC: 15,
  stationPressureHpa: 1000,
  relativeHumidityPct: 50,
  densityKgM3: 1.2,
  dryAirDensityKgM3: 1.19,
  setupId: null,
  mainJet: 185,
  pilotJet: null,
  needleClipGroove: null,
  airScrewTurnsOut: null,
  plugColour: null,
  ran: 'right',
  lapTimeMs: null,
  note: '',
  createdAt: '2026-11-01T10:00:00.000Z',
  ...over,
});

describe('jetting chart data', () => {
  it('groups sessions by how they ran', () => {
    const pts = sessionPoints([session({ ran: 'right' }), session({ ran: 'lean', mainJet: 180, track: 'Club' }), session({ ran: 'right', mainJet: 187.5 })]);
    expect(pts.right.map((p) => p.mainJet)).toEqual([185, 187.5]);
    expect(pts.lean).toEqual([{ density: 1.2, mainJet: 180, label: '2026-11-01, Club' }]);
    expect(pts.rich).toEqual([]);
  });

  it('draws the suggestion line through the baseline, following the metering law', () => {
    const base = { densityKgM3: 1.18, mainJet: 182.5 };
    const line = suggestionLine(base, 'diameter', [1.1, 1.26], 16);
    expect(line).toHaveLength(17);
    // Jet flow area ∝ √ρ to hold the mixture (Heywood, Internal Combustion Engine Fundamentals, 1988, ch. 7);
    // a diameter-numbered jet's number goes as the square root of its area, so as ρ^(1/4).
    for (const p of line) expect(p.mainJet).toBeCloseTo(182.5 * (p.density / 1.18) ** 0.25, 9);
    const atBase = suggestionLine(base, 'flow', [1.18, 1.18], 1);
    expect(atBase[0].mainJet).toBeCloseTo(182.5, 12);
    // Flow-numbered jets: the number follows area, so ρ^(1/2) (same source).
    const flow = suggestionLine(base, 'flow', [1.1, 1.26], 2);
    expect(flow[2].mainJet).toBeCloseTo(182.5 * Math.sqrt(1.26 / 1.18), 9);
    // Denser air needs a bigger jet (same source): the line rises with density.
    expect(line[16].mainJet).toBeGreaterThan(line[0].mainJet);
  });

  it('pads the axes so every point is inside', () => {
    const [lo, hi] = densityDomain([1.17, 1.23]);
    expect(lo).toBeLessThan(1.17);
    expect(hi).toBeGreaterThan(1.23);
    expect(jetDomain([182.5, 187.5])).toEqual([180, 190]);
    expect(jetDomain([181, 186])).toEqual([177.5, 190]);
    expect(densityDomain([])).toEqual([1.1, 1.3]);
  });

  it('puts axis ticks on round values, no more than asked for', () => {
    expect(niceTicks([177.5, 192.5], JET_TICK_STEPS, 7)).toEqual([177.5, 180, 182.5, 185, 187.5, 190, 192.5]);
    expect(niceTicks([177.5, 192.5], JET_TICK_STEPS, 4)).toEqual([180, 185, 190]);
    expect(niceTicks([1.14, 1.295], DENSITY_TICK_STEPS, 6)).toEqual([1.15, 1.2, 1.25]);
    expect(niceTicks([1.14, 1.295], DENSITY_TICK_STEPS, 9)).toEqual([1.14, 1.16, 1.18, 1.2, 1.22, 1.24, 1.26, 1.28]);
  });
});
