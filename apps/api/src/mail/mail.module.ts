import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { OutboxMessage } from './entities/outbox-message.entity';
import { MailTransport } from './mail-transport';
import { NotificationsService } from './notifications.service';
import { OutboxService } from './outbox.service';
import { OutboxWorker } from './outbox.worker';

@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessage])],
  providers: [MailTransport, OutboxService, OutboxWorker, NotificationsService],
  exports: [OutboxService, OutboxWorker, NotificationsService],
})
export class MailModule {}
