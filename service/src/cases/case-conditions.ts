import type { DiagnosisConditions } from '@fuelwright/shared';
import type { AirDensityBaseline } from '../jetting/air-density-baseline.js';

/**
 * The conditions as the ranking takes them: when today's air density is given and the change is
 * not, the change against the kart's last jetting-log session that ran right (the fact behind
 * "air density changed since the jetting was right").
 */
export async function withDensityChange(airBaseline: AirDensityBaseline, kartId: string, conditions: DiagnosisConditions): Promise<DiagnosisConditions> {
  if (conditions.densityChangePct !== undefined || !conditions.today?.densityKgM3) return conditions;
  const day = await airBaseline.baselineOf(kartId);
  const pct = await airBaseline.densityChangeSince(kartId, conditions.today.densityKgM3);
  if (!day || pct === null) return conditions;
  return { ...conditions, densityChangePct: pct, reference: { ...conditions.reference, densityKgM3: day.densityKgM3 } };
}
