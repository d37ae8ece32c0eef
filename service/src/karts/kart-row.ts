import { eq } from 'drizzle-orm';
import { karts, users, type Db } from '@fuelwright/db';
import type { KartDto } from '@fuelwright/shared';

export const kartColumns = {
  id: karts.id,
  ownerId: karts.ownerId,
  ownerName: users.displayName,
  name: karts.name,
  displacementCc: karts.displacementCc,
  drive: karts.drive,
  carburettorKind: karts.carburettorKind,
  notes: karts.notes,
  createdAt: karts.createdAt,
  updatedAt: karts.updatedAt,
};

export type KartRow = Omit<KartDto, 'createdAt' | 'updatedAt'> & { createdAt: Date; updatedAt: Date };

export function selectKarts(db: Db) {
  return db.select(kartColumns).from(karts).innerJoin(users, eq(users.id, karts.ownerId));
}

export async function findKart(db: Db, id: string): Promise<KartRow | undefined> {
  const [row] = await selectKarts(db).where(eq(karts.id, id)).limit(1);
  return row;
}

export function toKartDto(r: KartRow): KartDto {
  return { ...r, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString() };
}
