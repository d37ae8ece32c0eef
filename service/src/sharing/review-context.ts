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

  caseUrl(caseId: string): string {
    return `${this.publicUrl}/cases/${caseId}`;
  }
}
