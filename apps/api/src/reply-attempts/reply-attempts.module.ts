import { Module } from '@nestjs/common';
import { ClaimsModule } from '../claims/claims.module';
import { ReplyAttemptsController } from './reply-attempts.controller';

@Module({ imports: [ClaimsModule], controllers: [ReplyAttemptsController] })
export class ReplyAttemptsModule {}
