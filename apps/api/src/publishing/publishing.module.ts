import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ClaimsModule } from '../claims/claims.module';
import { MailModule } from '../mail/mail.module';
import { SearchModule } from '../search/search.module';
import { PublicationScheduler } from './publication-scheduler';
import { PublishingController } from './publishing.controller';
import { PublishingService } from './publishing.service';
import { ReaderSubscriptionsService } from './reader-subscriptions.service';

@Module({
  imports: [ClaimsModule, AuditModule, MailModule, SearchModule],
  controllers: [PublishingController],
  providers: [PublishingService, ReaderSubscriptionsService, PublicationScheduler],
  exports: [PublishingService, ReaderSubscriptionsService],
})
export class PublishingModule {}
