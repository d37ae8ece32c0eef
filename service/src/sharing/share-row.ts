import { and, eq, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { karts, shares, users, type Db } from '@fuelwright/db';
import type { ShareDto } from '@fuelwright/shared';

const grantee = alias(users, 'grantee');

export async function selectShares(db: Db, where: SQL): Promise<ShareDto[]> {
  const rows = await db
    .select({ s: shares, kartName: karts.name, granteeName: grantee.displayName })
    .from(shares)
    .innerJoin(karts, eq(karts.id, shares.kartId))
    .leftJoin(grantee, eq(grantee.id, shares.granteeId))
    .where(and(where))
    .orderBy(shares.createdAt);
  return rows.map(({ s, kartName, granteeName }) => ({
    id: s.id,
    scope: s.scope,
    kartId: s.kartId,
    kartName,
    caseId: s.caseId,
    inviteeEmail: s.inviteeEmail,
    as: s.inviteeRole === 'shop' ? 'shop' : 'coach',
    granteeId: s.granteeId,
    granteeName: granteeName ?? null,
    status: s.revokedAt ? 'revoked' : s.granteeId ? 'active' : 'invited',
    createdAt: s.createdAt.toISOString(),
  }));
}
