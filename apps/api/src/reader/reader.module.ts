import { Module } from '@nestjs/common';
import { PublishingModule } from '../publishing/publishing.module';
import { SearchModule } from '../search/search.module';
import { StorageModule } from '../storage/storage.module';
import { ReaderController } from './reader.controller';
import { ReaderService } from './reader.service';

/** The reader side: published explainers, their feed, corrections and methodology, no sign-in. */
@Module({
  imports: [PublishingModule, SearchModule, StorageModule],
  controllers: [ReaderController],
  providers: [ReaderService],
  exports: [ReaderService],
})
export class ReaderModule {}
