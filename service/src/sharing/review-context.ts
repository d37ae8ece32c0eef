import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../config/app.config.js';
import { AccessPolicy, type Action } from '../common/access/access-policy.js';
import type { SessionUser } from '../common/session-user.js';
import { CaseStore, type LoadedCase } from '../cases/case-store.js';

/** Loads a case for a review step (comment, recommend, photo) and builds links to it. */
@Injectable()
export class ReviewContext {
  private readonly publicUrl: string;

  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  async load(user: SessionUser, caseId: string, action: Action): Promise<LoadedCase> {
    const loaded = await this.store.load(caseId);
    await this.access.requireCase(user, loaded && { ownerId: loaded.row.ownerId }, { caseId, kartId: loaded?.row.kartId ?? '' }, action);
    return loaded!;
  }

  /**
   * The part someone plays on this case, for the tag beside their name: the owner is the racer, a
   * grantee is what the owner shared it with them as (coach or shop), whatever their account role;
   * anyone else shows their account role.
   */
  async partsOn(c: LoadedCase): Promise<(userId: string | null, accountRole: string | null) => string | null> {
    const labels = await this.access.shareLabelsOfCase(c.row.id, c.row.kartId);
    return (userId, accountRole) => {
      if (userId === null) return null;
      if (userId === c.row.ownerId) return 'racer';
      return labels.get(userId) ?? accountRole;
    };
  }

  caseUrl(caseId: string): string {
    return `${this.publicUrl}/cases/${caseId}`;
  }
}
