import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import { and, eq, gte, inArray } from 'drizzle-orm';
import { cases, karts, outbox, users, type Db } from '@fuelwright/db';
import type { SessionUser } from '../common/session-user.js';
import { DB, DEMO_JUST_SEEDED } from '../database/database.tokens.js';
import { OpenCaseCommand } from '../cases/commands/open-case.command.js';
import { RecordCheckResultCommand } from '../cases/commands/record-check-result.command.js';
import { ResolveCaseCommand } from '../cases/commands/resolve-case.command.js';
import { CreateShareCommand } from '../sharing/commands/create-share.command.js';
import { AcceptInvitationCommand } from '../sharing/commands/accept-invitation.command.js';
import { AddCommentCommand } from '../sharing/commands/add-comment.command.js';
import { RequestPhotoCommand } from '../sharing/commands/request-photo.command.js';
import { LogOutcomeCommand } from '../learning/commands/log-outcome.command.js';
import { DEMO_HISTORY as H } from './demo-history.data.js';

/**
 * Gives the demo club some history, right after it is seeded on an empty database: a resolved case
 * with the shop's outcome, and an open case shared with the demo coach, who has commented and asked
 * for a photo. Everything goes through the command bus, so it is exactly what the app would write.
 *
 * No demo mail goes out: at start this runs before the mail module's bootstrap hook (see DemoModule),
 * so the outbox has no sender yet; the invitation links are read from the queued messages and
 * accepted, and every message the history queued is then deleted.
 */
@Injectable()
export class DemoHistory implements OnApplicationBootstrap {
  private readonly log = new Logger('DemoHistory');

  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(DEMO_JUST_SEEDED) private readonly justSeeded: boolean,
    private readonly commands: CommandBus,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.justSeeded) return;
    if (await this.run()) this.log.log('Demo history added: a resolved case with its outcome, and an open case shared with the demo coach (invented)');
  }

  /** Writes the history once; false (and nothing written) when the demo racer already has cases or a demo account is missing. */
  async run(): Promise<boolean> {
    const who = await this.users();
    if (!who) return false;
    const { racer, coach, shop } = who;
    const existing = await this.db.select({ id: cases.id }).from(cases).where(eq(cases.ownerId, racer.id)).limit(1);
    if (existing.length > 0) return false;
    const kartIds = await this.kartIds(racer.id);
    const resolvedKart = kartIds.get(H.resolved.kart);
    const openKart = kartIds.get(H.open.kart);
    if (!resolvedKart || !openKart) return false;
    const mailFrom = new Date(Date.now() - 1000);
    const bus = this.commands;

    // 1. The resolved case on the pump-around shifter.
    const done = await bus.execute(new OpenCaseCommand(racer, { kartId: resolvedKart, symptoms: [...H.resolved.symptoms] }));
    for (const c of H.resolved.checks) await bus.execute(new RecordCheckResultCommand(racer, done.id, c));
    await bus.execute(new ResolveCaseCommand(racer, done.id, { causeId: H.resolved.causeId, fix: H.resolved.fix, note: H.resolved.note }));
    await this.shareAndAccept(racer, shop, done.id, 'shop');
    await bus.execute(new LogOutcomeCommand(shop, { caseId: done.id, confirmedCauses: [H.resolved.causeId], ...H.resolved.outcome }));

    // 2. The open case on the practice kart, shared with the coach.
    const open = await bus.execute(new OpenCaseCommand(racer, { kartId: openKart, symptoms: [...H.open.symptoms] }));
    await bus.execute(new RecordCheckResultCommand(racer, open.id, H.open.check));
    await this.shareAndAccept(racer, coach, open.id, 'coach');
    await bus.execute(new AddCommentCommand(coach, open.id, H.open.comment));
    await bus.execute(new RequestPhotoCommand(coach, open.id, H.open.photo.what, H.open.photo.checkId));

    // Nothing of this is mailed: drop what the steps queued for the demo accounts.
    await this.db.delete(outbox).where(and(gte(outbox.createdAt, mailFrom), inArray(outbox.toEmail, [racer.email, coach.email, shop.email])));
    return true;
  }

  /** Shares a case and accepts it as the grantee, with the link from the queued invitation. */
  private async shareAndAccept(owner: SessionUser, grantee: SessionUser, caseId: string, as: 'coach' | 'shop'): Promise<void> {
    const share = await this.commands.execute(new CreateShareCommand(owner, { scope: 'case', caseId, email: grantee.email, as }));
    const invitations = await this.db
      .select({ text: outbox.text })
      .from(outbox)
      .where(and(eq(outbox.kind, 'invitation'), eq(outbox.toEmail, grantee.email)));
    // The newest queued invitation to this address is the one just made (ids are random: match on the token's link instead).
    for (const m of invitations.reverse()) {
      const token = /\/invitations\/([A-Za-z0-9_-]+)/.exec(m.text)?.[1];
      if (!token) continue;
      try {
        const accepted = await this.commands.execute(new AcceptInvitationCommand(grantee, token));
        if (accepted.share.id === share.id) return;
      } catch {
        // an older, used-up link: try the next
      }
    }
    throw new Error(`demo history: could not accept the share of case ${caseId} as ${grantee.email}`);
  }

  private async users(): Promise<{ racer: SessionUser; coach: SessionUser; shop: SessionUser } | null> {
    const rows = await this.db.select().from(users).where(inArray(users.email, [H.racer, H.coach, H.shop]));
    const as = (email: string): SessionUser | undefined => {
      const u = rows.find((r) => r.email === email);
      return u && { id: u.id, email: u.email, displayName: u.displayName, role: u.role, createdAt: u.createdAt, emailVerifiedAt: u.emailVerifiedAt, sessionId: 'demo-history' };
    };
    const racer = as(H.racer);
    const coach = as(H.coach);
    const shop = as(H.shop);
    return racer && coach && shop ? { racer, coach, shop } : null;
  }

  private async kartIds(ownerId: string): Promise<Map<string, string>> {
    const rows = await this.db.select({ id: karts.id, name: karts.name }).from(karts).where(eq(karts.ownerId, ownerId));
    return new Map(rows.map((k) => [k.name, k.id]));
  }
}
