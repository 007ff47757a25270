import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ClaimsModule } from '../claims/claims.module';
import { MailModule } from '../mail/mail.module';
import { SearchModule } from '../search/search.module';
import { ClaimLifeController } from './claim-life.controller';
import { ClaimLifeService } from './claim-life.service';

@Module({
  imports: [ClaimsModule, AuditModule, MailModule, SearchModule],
  controllers: [ClaimLifeController],
  providers: [ClaimLifeService],
  exports: [ClaimLifeService],
})
export class ClaimLifeModule {}
