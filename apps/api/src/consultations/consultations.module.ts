import { Module } from '@nestjs/common';
import { ClaimsModule } from '../claims/claims.module';
import { ConsultationsController } from './consultations.controller';

@Module({ imports: [ClaimsModule], controllers: [ConsultationsController] })
export class ConsultationsModule {}
