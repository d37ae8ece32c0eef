import { Inject, Injectable } from '@nestjs/common';
import { inArray } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { AccessPolicy } from '../common/access/access-policy.js';
import { DB } from '../database/database.tokens.js';

export interface Recipient {
  id: string;
  email: string;
  displayName: string;
}

/** Who hears about a step on a case: its owner and everyone it is shared with, except the one who acted. */
@Injectable()
export class CaseAudience {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async of(c: { caseId: string; kartId: string; ownerId: string }, exceptUserId: string): Promise<Recipient[]> {
    const ids = [...new Set([c.ownerId, ...(await this.access.granteesOfCase(c.caseId, c.kartId))])].filter((id) => id !== exceptUserId);
    if (ids.length === 0) return [];
    return this.db.select({ id: users.id, email: users.email, displayName: users.displayName }).from(users).where(inArray(users.id, ids));
  }
}
