import { Injectable, NotFoundException } from '@nestjs/common';
import type { Role } from '@fuelwright/shared';

/** How the user stands to a kart or a case. */
export type Relation = 'owner' | 'shared' | 'other';

/** What someone may want to do with a kart or a case. */
export const ACTIONS = ['view', 'edit', 'delete', 'share', 'comment', 'recommend-check', 'log-outcome'] as const;
export type Action = (typeof ACTIONS)[number];

/**
 * The one access policy, used by every handler that touches a kart or a case.
 * Owners do everything. Someone the owner shared with (a coach or a shop) may look, comment,
 * recommend a check and log an outcome, never change the facts. Everyone else sees nothing: the
 * item answers 404, so its existence does not leak. Roles do not widen this: an admin manages
 * users and rulesets, not other people's karts.
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
  /** User ids the owner shared this item with (filled in by sharing, a later feature). */
  sharedWith?: readonly string[];
}

export function relationOf(subject: Subject, resource: Resource): Relation {
  if (resource.ownerId === subject.id) return 'owner';
  if (resource.sharedWith?.includes(subject.id) && (subject.role === 'coach' || subject.role === 'shop')) return 'shared';
  return 'other';
}

export function isAllowed(subject: Subject, resource: Resource, action: Action): boolean {
  return ALLOWED[relationOf(subject, resource)].has(action);
}

@Injectable()
export class AccessPolicy {
  /**
   * Returns the resource when the subject may do the action; otherwise 404 (not 403), so that
   * another racer's ids tell nothing.
   */
  require<T extends Resource>(subject: Subject, resource: T | undefined | null, action: Action, what = 'item'): T {
    if (!resource || !isAllowed(subject, resource, action)) throw new NotFoundException(`No such ${what}.`);
    return resource;
  }
}
