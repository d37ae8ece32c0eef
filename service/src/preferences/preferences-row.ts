import { eq } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { normalizeUnitPreferences, type UserPreferences } from '@fuelwright/shared';

/** users.preferences is a JSON object; `units` is ours, other keys are kept as they are. */
export async function readStoredPreferences(db: Db, userId: string): Promise<Record<string, unknown>> {
  const [row] = await db.select({ preferences: users.preferences }).from(users).where(eq(users.id, userId)).limit(1);
  const p = row?.preferences;
  return typeof p === 'object' && p !== null && !Array.isArray(p) ? (p as Record<string, unknown>) : {};
}

/** What is stored, with the defaults filled in field by field. */
export function toUserPreferences(stored: Record<string, unknown>): UserPreferences {
  return { units: normalizeUnitPreferences(stored.units) };
}
