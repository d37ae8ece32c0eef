import { createHmac, timingSafeEqual } from 'node:crypto';
import { ConflictException, Inject, Injectable, Logger, NotFoundException, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, asc, desc, eq, gt, inArray, isNull, lt, lte, or, sql } from 'drizzle-orm';
import nodemailer, { type Transporter } from 'nodemailer';
import { outbox, users, type Db, type OutboxRow } from '@fuelwright/db';
import { NOTICE_KINDS, type NoticeKind, type NoticeSettings } from '@fuelwright/shared';
import type { AppConfig } from '../config/app.config.js';
import { DB } from '../database/database.tokens.js';
import { MailCaptureServer } from './mail-capture.server.js';
import { renderMail, type MailContent, type MailKind } from './mail-templates.js';
import { backoffMs, MAX_ATTEMPTS } from './retry-schedule.js';

/** Messages one sender claims at a time, and how long its claim holds (well beyond ten slow sends). */
const CLAIM_BATCH = 10;
const CLAIM_LEASE_MS = 10 * 60_000;

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface QueuedMail {
  kind: MailKind;
  toEmail: string;
  toUserId?: string | null;
  content: MailContent;
}

/**
 * A notice gathered over a hold: while it waits, later steps with the same `key` to the same
 * address rewrite it (`content` renders every step so far) instead of queuing another message.
 */
export interface CoalescedMail {
  kind: NoticeKind;
  toEmail: string;
  toUserId: string;
  /** What the steps belong to, e.g. `case-progress:<case id>`. */
  key: string;
  step: string;
  holdMs: number;
  content: (steps: string[]) => MailContent;
}

const isNotice = (k: MailKind): k is NoticeKind => (NOTICE_KINDS as readonly string[]).includes(k);

/**
 * The outbox: messages are written in the same transaction as what causes them, then sent by a
 * poller with retries, so neither a comment nor its notice is ever lost to a mail outage.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly log = new Logger('Mail');
  private readonly config: AppConfig;
  private transport?: Transporter;
  private timer?: NodeJS.Timeout;
  private running?: Promise<number>;
  readonly capture?: MailCaptureServer;

  constructor(
    @Inject(DB) private readonly db: Db,
    config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>('app');
    if (!this.config.smtpUrl) this.capture = new MailCaptureServer();
  }

  async onApplicationBootstrap(): Promise<void> {
    if (this.capture) {
      const port = await this.capture.start(this.config.mailCapturePort);
      this.transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    } else {
      this.transport = nodemailer.createTransport(this.config.smtpUrl);
    }
    if (this.config.mailPollMs > 0) {
      this.timer = setInterval(() => void this.flush().catch((e) => this.log.error(e)), this.config.mailPollMs);
      this.timer.unref();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.running?.catch(() => undefined);
    this.transport?.close();
    await this.capture?.stop();
  }

  /** Signed, per-user, per-kind unsubscribe token (no expiry: the link in an old e-mail keeps working). */
  unsubscribeToken(userId: string, kind: NoticeKind): string {
    const body = `${userId}.${kind}`;
    const mac = createHmac('sha256', this.config.sessionSecret).update(`unsubscribe:${body}`).digest('base64url');
    return Buffer.from(`${body}.${mac}`).toString('base64url');
  }

  readUnsubscribeToken(token: string): { userId: string; kind: NoticeKind } | null {
    let decoded: string;
    try {
      decoded = Buffer.from(token, 'base64url').toString('utf8');
    } catch {
      return null;
    }
    const [userId, kind, mac] = decoded.split('.');
    if (!userId || !kind || !mac || !isNotice(kind as MailKind)) return null;
    const expected = createHmac('sha256', this.config.sessionSecret).update(`unsubscribe:${userId}.${kind}`).digest('base64url');
    const a = Buffer.from(mac);
    const b = Buffer.from(expected);
    return a.length === b.length && timingSafeEqual(a, b) ? { userId, kind: kind as NoticeKind } : null;
  }

  async noticeSettings(userId: string, db: Db | Tx = this.db): Promise<NoticeSettings> {
    const [row] = await db.select({ p: users.preferences }).from(users).where(eq(users.id, userId));
    return ((row?.p as { notices?: NoticeSettings } | undefined)?.notices ?? {}) as NoticeSettings;
  }

  async setNoticeSettings(userId: string, settings: NoticeSettings): Promise<NoticeSettings> {
    const current = await this.noticeSettings(userId);
    const merged = { ...current, ...settings };
    await this.db
      .update(users)
      .set({ preferences: sql`${users.preferences} || jsonb_build_object('notices', ${JSON.stringify(merged)}::jsonb)` })
      .where(eq(users.id, userId));
    return merged;
  }

  /**
   * Queues a message inside the caller's transaction. A notice to a user who turned that kind off
   * is not queued. Returns whether it was queued.
   */
  async enqueue(tx: Db | Tx, mail: QueuedMail): Promise<boolean> {
    const unsubscribeUrl = await this.unsubscribeUrlFor(tx, mail);
    if (unsubscribeUrl === false) return false;
    const { subject, text, html } = renderMail(mail.content, unsubscribeUrl);
    await tx.insert(outbox).values({
      kind: mail.kind,
      toEmail: mail.toEmail,
      toUserId: mail.toUserId ?? null,
      subject,
      text,
      html,
      unsubscribable: Boolean(unsubscribeUrl),
    });
    this.kick();
    return true;
  }

  /** The unsubscribe link a notice carries; false when its recipient turned that kind off. */
  private async unsubscribeUrlFor(tx: Db | Tx, mail: { kind: MailKind; toUserId?: string | null }): Promise<string | undefined | false> {
    if (!isNotice(mail.kind) || !mail.toUserId) return undefined;
    const settings = await this.noticeSettings(mail.toUserId, tx);
    if (settings[mail.kind] === false) return false;
    return `${this.config.publicUrl}/unsubscribe?token=${this.unsubscribeToken(mail.toUserId, mail.kind)}`;
  }

  /**
   * Queues a notice held for `holdMs` inside the caller's transaction, or adds the step to the one
   * still held for the same key and address (never tried, not claimed by a sender: the row is
   * locked here, and a sender skips locked rows). The hold runs from the first step, so a busy
   * session at the track still reaches the recipient within one hold. Returns 'queued', 'added'
   * or false (the recipient turned the kind off).
   */
  async enqueueCoalesced(tx: Db | Tx, mail: CoalescedMail): Promise<'queued' | 'added' | false> {
    const unsubscribeUrl = await this.unsubscribeUrlFor(tx, mail);
    if (unsubscribeUrl === false) return false;
    const now = new Date();
    const [held] = await tx
      .select({ id: outbox.id, steps: outbox.coalescedSteps })
      .from(outbox)
      .where(
        and(
          eq(outbox.coalesceKey, mail.key),
          eq(outbox.toEmail, mail.toEmail),
          eq(outbox.kind, mail.kind),
          eq(outbox.status, 'pending'),
          eq(outbox.attempts, 0),
          gt(outbox.nextAttemptAt, now),
          or(isNull(outbox.lockedUntil), lt(outbox.lockedUntil, now)),
        ),
      )
      .orderBy(desc(outbox.createdAt))
      .limit(1)
      .for('update');
    const steps = [...(held?.steps ?? []), mail.step];
    const { subject, text, html } = renderMail(mail.content(steps), unsubscribeUrl);
    if (held) {
      await tx.update(outbox).set({ subject, text, html, coalescedSteps: steps }).where(eq(outbox.id, held.id));
      return 'added';
    }
    await tx.insert(outbox).values({
      kind: mail.kind,
      toEmail: mail.toEmail,
      toUserId: mail.toUserId,
      subject,
      text,
      html,
      unsubscribable: Boolean(unsubscribeUrl),
      nextAttemptAt: new Date(now.getTime() + mail.holdMs),
      coalesceKey: mail.key,
      coalescedSteps: steps,
    });
    return 'queued';
  }

  /** Ends the hold on every message still gathering steps under `key`: they go with the next send. */
  async releaseHeld(tx: Db | Tx, key: string): Promise<void> {
    const now = new Date();
    const released = await tx
      .update(outbox)
      .set({ nextAttemptAt: now })
      .where(and(eq(outbox.coalesceKey, key), eq(outbox.status, 'pending'), eq(outbox.attempts, 0), gt(outbox.nextAttemptAt, now)))
      .returning({ id: outbox.id });
    if (released.length > 0) this.kick();
  }

  /**
   * Queues a message that was marked failed again, with a fresh retry schedule (after the admin has
   * fixed the mail settings, say). 404 for no such message, 409 for one that is not failed.
   */
  async retry(id: string): Promise<{ id: string; status: 'pending' }> {
    const [row] = await this.db
      .update(outbox)
      .set({ status: 'pending', attempts: 0, nextAttemptAt: new Date() })
      .where(and(eq(outbox.id, id), eq(outbox.status, 'failed')))
      .returning({ id: outbox.id });
    if (!row) {
      const [existing] = await this.db.select({ status: outbox.status }).from(outbox).where(eq(outbox.id, id));
      if (!existing) throw new NotFoundException('No such message.');
      throw new ConflictException(`Only a failed message can be queued again; this one is ${existing.status === 'sent' ? 'sent' : 'still being retried'}.`);
    }
    this.kick();
    return { id: row.id, status: 'pending' };
  }

  /** Sends soon, without waiting for the next poll. */
  private kick(): void {
    if (this.config.mailPollMs > 0) setImmediate(() => void this.flush().catch((e) => this.log.error(e)));
  }

  /**
   * Sends every due message once; returns how many were sent. Runs one at a time. `asOf` (tests,
   * and nothing else) sends what will be due by then, such as a notice still held to gather steps.
   */
  flush(opts: { asOf?: Date } = {}): Promise<number> {
    if (this.running) return this.running.then(() => this.flushNow(opts.asOf));
    return this.flushNow(opts.asOf);
  }

  private flushNow(asOf?: Date): Promise<number> {
    const run = this.sendDue(asOf).finally(() => {
      if (this.running === run) this.running = undefined;
    });
    this.running = run;
    return run;
  }

  /**
   * Claims due messages for this sender in one statement: rows another sender holds are skipped
   * (FOR UPDATE SKIP LOCKED) and rows it has leased are left alone, so two app instances on one
   * database never send a message twice. The lease outlives a batch of slow sends; if a sender
   * dies holding it, the rows are due again once it has passed.
   */
  private async claimDue(asOf?: Date): Promise<OutboxRow[]> {
    const now = new Date();
    const due = this.db
      .select({ id: outbox.id })
      .from(outbox)
      .where(and(eq(outbox.status, 'pending'), lte(outbox.nextAttemptAt, asOf ?? now), or(isNull(outbox.lockedUntil), lt(outbox.lockedUntil, now))))
      .orderBy(asc(outbox.createdAt))
      .limit(CLAIM_BATCH)
      .for('update', { skipLocked: true });
    const rows = await this.db
      .update(outbox)
      .set({ lockedUntil: new Date(now.getTime() + CLAIM_LEASE_MS) })
      .where(inArray(outbox.id, due))
      .returning();
    return rows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  }

  private async sendDue(asOf?: Date): Promise<number> {
    if (!this.transport) return 0;
    let sent = 0;
    for (let due = await this.claimDue(asOf); due.length > 0; due = await this.claimDue(asOf)) sent += await this.sendClaimed(due, asOf);
    return sent;
  }

  /** A failed send waits its backoff from `asOf` when given, so one flush never retries it at once. */
  private async sendClaimed(due: OutboxRow[], asOf?: Date): Promise<number> {
    const transport = this.transport!;
    let sent = 0;
    for (const m of due) {
      try {
        const unsubscribeHeader = m.unsubscribable ? /Stop these e-mails: (\S+)/.exec(m.text)?.[1] : undefined;
        const info = await transport.sendMail({
          from: this.config.mailFrom,
          to: m.toEmail,
          subject: m.subject,
          text: m.text,
          html: m.html,
          headers: { 'X-Fuelwright-Kind': m.kind },
          list: unsubscribeHeader ? { unsubscribe: unsubscribeHeader } : undefined,
        });
        await this.db
          .update(outbox)
          .set({ status: 'sent', sentAt: new Date(), attempts: m.attempts + 1, messageId: info.messageId, lastError: null, lockedUntil: null })
          .where(eq(outbox.id, m.id));
        sent++;
      } catch (e) {
        const attempts = m.attempts + 1;
        const failed = attempts >= MAX_ATTEMPTS;
        await this.db
          .update(outbox)
          .set({
            attempts,
            lastError: e instanceof Error ? e.message : String(e),
            status: failed ? 'failed' : 'pending',
            nextAttemptAt: new Date(Math.max(Date.now(), asOf?.getTime() ?? 0) + backoffMs(attempts)),
            lockedUntil: null,
          })
          .where(eq(outbox.id, m.id));
        this.log.warn(`Sending "${m.subject}" to ${m.toEmail} failed (attempt ${attempts}${failed ? ', giving up' : ''}): ${e instanceof Error ? e.message : e}`);
      }
    }
    return sent;
  }
}
