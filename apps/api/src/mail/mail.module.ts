import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { OutboxMessage } from './entities/outbox-message.entity';
import { MailTransport } from './mail-transport';
import { NotificationsService } from './notifications.service';
import { OutboxAdminService } from './outbox-admin.service';
import { OutboxController } from './outbox.controller';
import { OutboxService } from './outbox.service';
import { OutboxWorker } from './outbox.worker';

@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessage]), AuditModule],
  controllers: [OutboxController],
  providers: [MailTransport, OutboxService, OutboxWorker, NotificationsService, OutboxAdminService],
  exports: [OutboxService, OutboxWorker, NotificationsService],
})
export class MailModule {}
