import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { SearchModule } from '../search/search.module';
import { ClaimsModule } from '../claims/claims.module';
import { ClaimSourcesController } from './claim-sources.controller';
import { Source } from './entities/source.entity';
import { SourcesController } from './sources.controller';
import { SourcesService } from './sources.service';

@Module({
  imports: [TypeOrmModule.forFeature([Source]), AuditModule, SearchModule, ClaimsModule],
  controllers: [SourcesController, ClaimSourcesController],
  providers: [SourcesService],
})
export class SourcesModule {}
