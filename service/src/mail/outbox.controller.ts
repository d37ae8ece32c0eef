import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { desc } from 'drizzle-orm';
import { Inject } from '@nestjs/common';
import { outbox, type Db } from '@fuelwright/db';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { Roles } from '../common/decorators/roles.decorator.js';
import { DB } from '../database/database.tokens.js';
import { MailService } from './mail.service.js';

/** What the app sent (or is retrying), for the admin; in development the local capture server received it. */
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
    const rows = await this.db.select().from(outbox).orderBy(desc(outbox.createdAt)).limit(200);
    return {
      capturing: Boolean(this.mail.capture),
      messages: rows.map((m) => ({
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
}
