import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { RankResponse } from '@fuelwright/shared';
import type { AppConfig } from '../config/app.config.js';
import type { SessionUser } from '../common/session-user.js';
import { MailService } from '../mail/mail.service.js';
import { CaseAudience } from './case-audience.js';
import type { LoadedCase, Tx } from './case-store.js';

/**
 * How long a progress notice waits for more steps before it is sent: a racer taps through several
 * checks in a few minutes at the track, and the coach gets one e-mail listing them, not one a tap.
 */
export const PROGRESS_HOLD_MS = 10 * 60_000;

const progressKey = (caseId: string) => `case-progress:${caseId}`;

const percent = (p: number) => `${Math.round(p * 100)} %`;

/** One line of a progress notice: the step, then where the ranking stands after it. */
export function progressLine(step: string, rank: Pick<RankResponse, 'causes' | 'stop'> | undefined): string {
  const top = rank?.causes[0];
  const after = top ? ` Top cause now: ${top.label} (${percent(top.probability)}).` : '';
  const stop = rank?.stop ? ` The walk-through stopped: ${rank.stop.reason}` : '';
  return `${step}.${after}${stop}`;
}

/**
 * E-mails the steps a racer takes on a case (a check result, changed symptoms, corrected setup or
 * air, abandoning it) to everyone else who can see it, gathered per recipient over
 * PROGRESS_HOLD_MS. Resolving has its own notice; it sends any progress still held first.
 */
@Injectable()
export class CaseProgressNotices {
  private readonly publicUrl: string;

  constructor(
    private readonly audience: CaseAudience,
    private readonly mail: MailService,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  /** Who will hear about a step; read before the step's transaction, like the other notices. */
  recipients(l: LoadedCase, actor: SessionUser) {
    return this.audience.of({ caseId: l.row.id, kartId: l.row.kartId, ownerId: l.row.ownerId }, actor.id);
  }

  /**
   * Queues (or adds to) each recipient's held progress notice inside the step's transaction. A step
   * that stops the walk-through (do not drive) is not held: the notice goes with the next send.
   */
  async queue(tx: Tx, l: LoadedCase, actor: SessionUser, to: Awaited<ReturnType<CaseProgressNotices['recipients']>>, line: string, sendNow = false): Promise<void> {
    for (const r of to) {
      await this.mail.enqueueCoalesced(tx, {
        kind: 'case-progress',
        toEmail: r.email,
        toUserId: r.id,
        key: progressKey(l.row.id),
        step: line,
        holdMs: PROGRESS_HOLD_MS,
        content: (steps) => ({
          subject: `Progress on the case of "${l.kartName}": ${steps.length === 1 ? '1 step' : `${steps.length} steps`}`,
          paragraphs: [`${actor.displayName} moved the case on "${l.kartName}" forward:`, ...steps.map((s) => `- ${s}`)],
          action: { label: 'Open the case', url: `${this.publicUrl}/cases/${l.row.id}` },
        }),
      });
    }
    if (sendNow) await this.release(tx, l.row.id);
  }

  /** Sends what is still held for this case now (before the case's resolved notice). */
  release(tx: Tx, caseId: string): Promise<void> {
    return this.mail.releaseHeld(tx, progressKey(caseId));
  }
}
