import { Module } from '@nestjs/common';
import { ClaimsModule } from '../claims/claims.module';
import { CommentsController } from './comments.controller';

@Module({ imports: [ClaimsModule], controllers: [CommentsController] })
export class CommentsModule {}
