import { type MiddlewareConsumer, Module, type NestModule } from '@nestjs/common';
import { PublishingModule } from '../publishing/publishing.module';
import { SearchModule } from '../search/search.module';
import { StorageModule } from '../storage/storage.module';
import { ReaderPageCache } from './reader-page-cache';
import { ReaderController } from './reader.controller';
import { readerPolicy } from './reader-policy';
import { ReaderService } from './reader.service';

/** The reader side: published explainers, their feed, corrections and methodology, no sign-in. */
@Module({
  imports: [PublishingModule, SearchModule, StorageModule],
  controllers: [ReaderController],
  providers: [ReaderService, ReaderPageCache],
  exports: [ReaderService],
})
export class ReaderModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(readerPolicy).forRoutes(ReaderController);
  }
}
