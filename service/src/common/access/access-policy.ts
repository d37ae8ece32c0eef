import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { and, eq, isNotNull, isNull, or } from 'drizzle-orm';
import { shares, type Db } from '@fuelwright/db';
import type { Role } from '@fuelwright/shared';
import { DB } from '../../database/database.tokens.js';

/** How the user stands to a kart or a case. */
export type Relation = 'owner' | 'shared' | 'other';

/** What someone may want to do with a kart or a case. */
export const ACTIONS = ['view', 'edit', 'delete', 'share', 'comment', 'recommend-check', 'log-outcome'] as const;
export type Action = (typeof ACTIONS)[number];

/**
 * The one access policy, used by every handler that touches a kart or a case.
 * Owners do everything. Someone who accepted the owner's share (the coach or shop the owner
 * invited) may look, comment, recommend a check and log an outcome, never change the facts. The
 * share alone grants this, whatever the account's role: an invited coach or shop signs up as a
 * racer account (only an admin changes roles), so roles can neither be gained through an
 * invitation nor be needed to review. Everyone else sees nothing: the item answers 404, so its
 * existence does not leak. Roles do not widen this: an admin manages users and rulesets, not
 * other people's karts.
 */
const ALLOWED: Record<Relation, ReadonlySet<Action>> = {
  owner: new Set(ACTIONS),
  shared: new Set<Action>(['view', 'comment', 'recommend-check', 'log-outcome']),
  other: new Set<Action>(),
};

export interface Subject {
  id: string;
  role: Role;
}

export interface Resource {
  ownerId: string;
  /** User ids that accepted an active share of this item (kart or case scope). */
  sharedWith?: readonly string[];
}

export function relationOf(subject: Subject, resource: Resource): Relation {
  if (resource.ownerId === subject.id) return 'owner';
  if (resource.sharedWith?.includes(subject.id)) return 'shared';
  return 'other';
}

export function isAllowed(subject: Subject, resource: Resource, action: Action): boolean {
  return ALLOWED[relationOf(subject, resource)].has(action);
}

@Injectable()
export class AccessPolicy {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Users with an active share of this kart (kart scope). */
  async granteesOfKart(kartId: string): Promise<string[]> {
    const rows = await this.db
      .select({ id: shares.granteeId })
      .from(shares)
      .where(and(eq(shares.kartId, kartId), eq(shares.scope, 'kart'), isNull(shares.revokedAt), isNotNull(shares.granteeId)));
    return rows.map((r) => r.id!);
  }

  /** Users with an active share of this case, directly or through its kart. */
  async granteesOfCase(caseId: string, kartId: string): Promise<string[]> {
    return [...(await this.shareLabelsOfCase(caseId, kartId)).keys()];
  }

  /** What each grantee is to the owner on this case (the share's "as": coach or shop); a kart share counts for its cases. */
  async shareLabelsOfCase(caseId: string, kartId: string): Promise<Map<string, string>> {
    const rows = await this.db
      .select({ id: shares.granteeId, as: shares.inviteeRole })
      .from(shares)
      .where(
        and(
          isNull(shares.revokedAt),
          isNotNull(shares.granteeId),
          or(and(eq(shares.scope, 'kart'), eq(shares.kartId, kartId)), and(eq(shares.scope, 'case'), eq(shares.caseId, caseId))),
        ),
      );
    return new Map(rows.map((r) => [r.id!, r.as]));
  }

  /** `require` for a kart, reading its shares when the user is not its owner. */
  async requireKart<T extends { id: string; ownerId: string }>(subject: Subject, kart: T | undefined, action: Action): Promise<T> {
    if (kart && kart.ownerId !== subject.id) {
      return this.require(subject, { ...kart, sharedWith: await this.granteesOfKart(kart.id) }, action, 'kart');
    }
    return this.require(subject, kart, action, 'kart');
  }

  /** `require` for a case, reading its shares (and its kart's) when the user is not its owner. */
  async requireCase<T extends { ownerId: string }>(subject: Subject, item: T | undefined, ids: { caseId: string; kartId: string }, action: Action): Promise<T> {
    if (item && item.ownerId !== subject.id) {
      return this.require(subject, { ...item, sharedWith: await this.granteesOfCase(ids.caseId, ids.kartId) }, action, 'case');
    }
    return this.require(subject, item, action, 'case');
  }

  /**
   * Returns the resource when the subject may do the action; otherwise 404 (not 403), so that
   * another racer's ids tell nothing.
   */
  require<T extends Resource>(subject: Subject, resource: T | undefined | null, action: Action, what = 'item'): T {
    if (!resource || !isAllowed(subject, resource, action)) throw new NotFoundException(`No such ${what}.`);
    return resource;
  }
}
