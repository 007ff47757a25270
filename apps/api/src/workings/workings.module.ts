import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ClaimsModule } from '../claims/claims.module';
import { WorkingPartsController, WorkingsController } from './workings.controller';
import { WorkingsService } from './workings.service';

@Module({
  imports: [ClaimsModule, AuditModule],
  controllers: [WorkingPartsController, WorkingsController],
  providers: [WorkingsService],
})
export class WorkingsModule {}
