import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
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
import { WorkOrdersService } from '../learning/work-orders.service.js';
import { DEMO_HISTORY as H } from './demo-history.data.js';

/**
 * Gives the demo club some history, right after it is seeded on an empty database: a resolved case
 * with the shop's outcome, an open case shared with the demo coach, who has commented and asked
 * for a photo, and two work orders at the demo shop (one open, on the second racer's shared case;
 * one finished walk-in with its outcome). Everything goes through the command bus (work orders, which
 * have no command, through the service behind their HTTP route), so it is exactly what the app would write.
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
    private readonly moduleRef: ModuleRef,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.justSeeded) return;
    if (await this.run()) this.log.log('Demo history added: a resolved case with its outcome, an open case shared with the demo coach, and an open and a finished work order at the demo shop (invented)');
  }

  /** Writes the history once; false (and nothing written) when the demo racer already has cases or a demo account is missing. */
  async run(): Promise<boolean> {
    const who = await this.users();
    if (!who) return false;
    const { racer, racer2, coach, shop } = who;
    const existing = await this.db.select({ id: cases.id }).from(cases).where(eq(cases.ownerId, racer.id)).limit(1);
    if (existing.length > 0) return false;
    const kartIds = await this.kartIds(racer.id);
    const resolvedKart = kartIds.get(H.resolved.kart);
    const openKart = kartIds.get(H.open.kart);
    const shopKart = (await this.kartIds(racer2.id)).get(H.shopOpen.kart);
    if (!resolvedKart || !openKart || !shopKart) return false;
    const workOrders = this.moduleRef.get(WorkOrdersService, { strict: false });
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

    // 3. The shop's open work order: the second racer's kart, its case shared with the shop.
    const inShop = await bus.execute(new OpenCaseCommand(racer2, { kartId: shopKart, symptoms: [...H.shopOpen.symptoms] }));
    await this.shareAndAccept(racer2, shop, inShop.id, 'shop');
    await workOrders.create(shop, { caseId: inShop.id, notes: H.shopOpen.notes });

    // 4. A walk-in the shop finished: logging its outcome marks the work order done.
    const walkIn = await workOrders.create(shop, { ...H.shopDone, symptoms: [...H.shopDone.symptoms], setup: { ...H.shopDone.setup } });
    await bus.execute(new LogOutcomeCommand(shop, { workOrderId: walkIn.id, ...H.shopDone.outcome, confirmedCauses: [...H.shopDone.outcome.confirmedCauses] }));

    // Nothing of this is mailed: drop what the steps queued for the demo accounts.
    await this.db.delete(outbox).where(and(gte(outbox.createdAt, mailFrom), inArray(outbox.toEmail, [racer.email, racer2.email, coach.email, shop.email])));
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

  private async users(): Promise<{ racer: SessionUser; racer2: SessionUser; coach: SessionUser; shop: SessionUser } | null> {
    const rows = await this.db.select().from(users).where(inArray(users.email, [H.racer, H.racer2, H.coach, H.shop]));
    const as = (email: string): SessionUser | undefined => {
      const u = rows.find((r) => r.email === email);
      return u && { id: u.id, email: u.email, displayName: u.displayName, role: u.role, createdAt: u.createdAt, emailVerifiedAt: u.emailVerifiedAt, sessionId: 'demo-history' };
    };
    const racer = as(H.racer);
    const racer2 = as(H.racer2);
    const coach = as(H.coach);
    const shop = as(H.shop);
    return racer && racer2 && coach && shop ? { racer, racer2, coach, shop } : null;
  }

  private async kartIds(ownerId: string): Promise<Map<string, string>> {
    const rows = await this.db.select({ id: karts.id, name: karts.name }).from(karts).where(eq(karts.ownerId, ownerId));
    return new Map(rows.map((k) => [k.name, k.id]));
  }
}
