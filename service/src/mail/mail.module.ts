import { Global, Module } from '@nestjs/common';
import { MailService } from './mail.service.js';
import { NotificationsController } from './notifications.controller.js';
import { OutboxController } from './outbox.controller.js';

@Global()
@Module({
  controllers: [NotificationsController, OutboxController],
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
