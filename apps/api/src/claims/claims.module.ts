import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { SearchModule } from '../search/search.module';
import { ClaimantsModule } from '../claimants/claimants.module';
import { MailModule } from '../mail/mail.module';
import { ClaimAssignmentService } from './claim-assignment.service';
import { ClaimDetailsReader } from './claim-details.reader';
import { ClaimStatusCounts } from './claim-status-counts';
import { ClaimPartsService } from './claim-parts.service';
import { ClaimsController } from './claims.controller';
import { ClaimsService } from './claims.service';
import { Claim } from './entities/claim.entity';

@Module({
  imports: [
    TypeOrmModule.forFeature([Claim]),
    AuditModule,
    SearchModule,
    MailModule,
    ClaimantsModule,
  ],
  controllers: [ClaimsController],
  providers: [
    ClaimsService,
    ClaimDetailsReader,
    ClaimStatusCounts,
    ClaimAssignmentService,
    ClaimPartsService,
  ],
  exports: [ClaimsService, ClaimPartsService],
})
export class ClaimsModule {}
