import { Controller, Get, HttpCode, NotFoundException, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { desc } from 'drizzle-orm';
import { Inject } from '@nestjs/common';
import { outbox, type Db } from '@fuelwright/db';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { Roles } from '../common/decorators/roles.decorator.js';
import { DB } from '../database/database.tokens.js';
import { UuidParam } from '../common/uuid-param.js';
import { MailService } from './mail.service.js';
import { redactTokenLinks } from './redact-links.js';

/**
 * What the app sent (or is retrying), for the admin, while the local capture server stands in for
 * a mail service (development, tests). With a real mail service the messages went to real inboxes
 * and the list is not served (404); links that carry a token are hidden whenever the capture is off.
 */
@ApiTags('admin')
@Roles('admin')
@Controller('admin/outbox')
export class OutboxController {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly mail: MailService,
  ) {}

  @Get()
  async list(): Promise<{ messages: OutboxMessageDto[]; capturing: boolean }> {
    const capturing = Boolean(this.mail.capture);
    if (!capturing) throw new NotFoundException('The outbox is shown only while the local mail capture is in use (development and tests).');
    const rows = await this.db.select().from(outbox).orderBy(desc(outbox.createdAt)).limit(200);
    // Belt and braces: should the 404 above ever be relaxed, reading the outbox still grants no invitation, reset or verification.
    const show = (m: OutboxMessageDto) => (capturing ? m : redactTokenLinks(m));
    return {
      capturing,
      messages: rows.map((m) => show({
        id: m.id,
        kind: m.kind,
        toEmail: m.toEmail,
        subject: m.subject,
        text: m.text,
        html: m.html,
        status: m.status,
        attempts: m.attempts,
        lastError: m.lastError,
        createdAt: m.createdAt.toISOString(),
        sentAt: m.sentAt?.toISOString() ?? null,
      })),
    };
  }

  /** Sends what is due now (after fixing the mail settings, say). */
  @Post('flush')
  @HttpCode(200)
  async flush(): Promise<{ sent: number }> {
    return { sent: await this.mail.flush() };
  }

  /** Queues a failed message again, with a fresh retry schedule. */
  @Post(':id/retry')
  @HttpCode(200)
  retry(@UuidParam('id', 'message') id: string): Promise<{ id: string; status: 'pending' }> {
    return this.mail.retry(id);
  }
}
