import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ClaimsModule } from '../claims/claims.module';
import { SignoffService } from './signoff.service';
import { VerdictsController } from './verdicts.controller';
import { VerdictsService } from './verdicts.service';

@Module({
  imports: [ClaimsModule, AuditModule],
  controllers: [VerdictsController],
  providers: [VerdictsService, SignoffService],
  exports: [VerdictsService],
})
export class VerdictsModule {}
