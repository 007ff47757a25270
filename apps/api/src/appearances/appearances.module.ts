import { Module } from '@nestjs/common';
import { ClaimsModule } from '../claims/claims.module';
import { AppearancesController } from './appearances.controller';

@Module({ imports: [ClaimsModule], controllers: [AppearancesController] })
export class AppearancesModule {}
