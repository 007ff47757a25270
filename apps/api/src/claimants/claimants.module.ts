import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { SearchModule } from '../search/search.module';
import { ClaimantsController } from './claimants.controller';
import { ClaimantsService } from './claimants.service';
import { Claimant } from './entities/claimant.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Claimant]), AuditModule, SearchModule],
  controllers: [ClaimantsController],
  providers: [ClaimantsService],
  exports: [ClaimantsService],
})
export class ClaimantsModule {}
