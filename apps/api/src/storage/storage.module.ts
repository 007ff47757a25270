import { Module } from '@nestjs/common';
import { storageConfig, type StorageConfig } from '../config/configuration';
import { FILE_STORAGE, type FileStorage } from './file-storage';
import { LocalFileStorage } from './local-file-storage';
import { S3FileStorage } from './s3-file-storage';

/** Provides `FILE_STORAGE`: the local disk or S3, as `FILES_STORAGE` says. */
@Module({
  providers: [
    {
      provide: FILE_STORAGE,
      inject: [storageConfig.KEY],
      useFactory: (config: StorageConfig): FileStorage =>
        config.driver === 's3'
          ? new S3FileStorage(config.s3)
          : new LocalFileStorage(config.directory),
    },
  ],
  exports: [FILE_STORAGE],
})
export class StorageModule {}
