import { scaleJet, type JetNumberScaling, type JettingSessionDto, type Ran } from '@fuelwright/shared';

export interface JetPoint {
  /** Air density, kg/m³. */
  density: number;
  mainJet: number;
  label: string;
}

/** Sessions as points of main jet against air density, grouped by how the kart ran. */
export function sessionPoints(sessions: readonly JettingSessionDto[]): Record<Ran, JetPoint[]> {
  const out: Record<Ran, JetPoint[]> = { rich: [], right: [], lean: [] };
  for (const s of sessions) {
    out[s.ran].push({ density: s.densityKgM3, mainJet: s.mainJet, label: `${s.sessionOn}${s.track ? `, ${s.track}` : ''}` });
  }
  return out;
}

/** [min, max] of the densities shown, widened a little so no point sits on the frame. */
export function densityDomain(densities: readonly number[]): [number, number] {
  if (densities.length === 0) return [1.1, 1.3];
  const lo = Math.min(...densities);
  const hi = Math.max(...densities);
  const pad = Math.max((hi - lo) * 0.15, 0.01);
  return [Math.floor((lo - pad) * 200) / 200, Math.ceil((hi + pad) * 200) / 200];
}

/** [min, max] of the jets shown, on whole steps of 2.5 with room above and below. */
export function jetDomain(jets: readonly number[]): [number, number] {
  if (jets.length === 0) return [0, 1];
  const lo = Math.min(...jets);
  const hi = Math.max(...jets);
  return [Math.floor((lo - 2.5) / 2.5) * 2.5, Math.ceil((hi + 2.5) / 2.5) * 2.5];
}

/**
 * The suggestion line: the main jet that keeps the baseline's mixture at each air density
 * (jet flow area ∝ √ρ, so the number ∝ ρ^¼ or ρ^½ by the kit's scaling), on moist-air density.
 * Today's suggestion also counts humidity (dry-air density), so its unrounded value can sit a hair
 * off this line.
 */
export function suggestionLine(
  baseline: { densityKgM3: number; mainJet: number },
  scaling: JetNumberScaling,
  [from, to]: [number, number],
  steps = 24,
): JetPoint[] {
  const points: JetPoint[] = [];
  for (let i = 0; i <= steps; i++) {
    const density = from + ((to - from) * i) / steps;
    points.push({
      density,
      mainJet: scaleJet(baseline.mainJet, { densityKgM3: baseline.densityKgM3 }, { densityKgM3: density }, scaling),
      label: 'Same mixture as the baseline',
    });
  }
  return points;
}

/** Round tick values from `from` to `to`: the smallest of `steps` that gives at most `maxTicks` ticks. */
export function niceTicks([from, to]: [number, number], steps: readonly number[], maxTicks: number): number[] {
  const step = steps.find((s) => Math.floor(to / s) - Math.ceil(from / s) + 1 <= maxTicks) ?? steps[steps.length - 1];
  const out: number[] = [];
  for (let k = Math.ceil(from / step - 1e-9); k * step <= to + 1e-9; k++) out.push(Math.round(k * step * 1e6) / 1e6);
  return out;
}

export const DENSITY_TICK_STEPS = [0.005, 0.01, 0.02, 0.05, 0.1] as const;
export const JET_TICK_STEPS = [1, 2.5, 5, 10, 20, 25, 50] as const;
