import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { AuditModule } from '../audit/audit.module';
import { ClaimsModule } from '../claims/claims.module';
import { storageConfig, type StorageConfig } from '../config/configuration';
import { StorageModule } from '../storage/storage.module';
import { AttachmentsController } from './attachments.controller';
import { AttachmentsService } from './attachments.service';
import { stagingDirectory } from './staged-upload';
import { stagingMulterStorage } from './staging-multer-storage';

@Module({
  imports: [
    AuditModule,
    ClaimsModule,
    StorageModule,
    MulterModule.registerAsync({
      inject: [storageConfig.KEY],
      useFactory: (config: StorageConfig) => ({
        storage: stagingMulterStorage({
          directory: stagingDirectory(config),
          maxBytes: config.maxUploadBytes,
        }),
        // Browsers send file names in UTF-8 without saying so.
        defParamCharset: 'utf8',
        limits: { files: 1, fields: 10, parts: 12 },
      }),
    }),
  ],
  controllers: [AttachmentsController],
  providers: [AttachmentsService],
  // MulterModule too: other features take uploads through the same staging engine.
  exports: [AttachmentsService, MulterModule],
})
export class AttachmentsModule {}
