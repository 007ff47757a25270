import { Module, type DynamicModule } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LoggerModule } from 'nestjs-pino';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { AttachmentsModule } from './attachments/attachments.module';
import { CalculatorsModule } from './calculators/calculators.module';
import { DatasetsModule } from './datasets/datasets.module';
import { ClaimLifeModule } from './claim-life/claim-life.module';
import { RatingsModule } from './ratings/ratings.module';
import { VerdictsModule } from './verdicts/verdicts.module';
import { PublishingModule } from './publishing/publishing.module';
import { ReaderModule } from './reader/reader.module';
import { AuditModule } from './audit/audit.module';
import { BenchModule } from './bench/bench.module';
import { AppearancesModule } from './appearances/appearances.module';
import { AuthModule } from './auth/auth.module';
import { ClaimantsModule } from './claimants/claimants.module';
import { ClaimsModule } from './claims/claims.module';
import { CommentsModule } from './comments/comments.module';
import { ConsultationsModule } from './consultations/consultations.module';
import { ReplyAttemptsModule } from './reply-attempts/reply-attempts.module';
import { WorkingsModule } from './workings/workings.module';
import { SearchModule } from './search/search.module';
import { SourcesModule } from './sources/sources.module';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { RolesGuard } from './common/guards/roles.guard';
import {
  appConfig,
  authConfig,
  databaseConfig,
  mailConfig,
  searchConfig,
  storageConfig,
  publishingConfig,
  type DatabaseConfig,
} from './config/configuration';
import { validateEnv } from './config/env.schema';
import { readerRoutePatterns } from './reader/reader-routes';
import { dataSourceOptions } from './database/data-source-options';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { UsersModule } from './users/users.module';

/** The built desk (apps/web/dist), served by the API with its index.html for desk routes. */
function webModules(): DynamicModule[] {
  const env = validateEnv(process.env);
  const rootPath = resolve(env.WEB_DIST_DIR ?? join(__dirname, '../../web/dist'));
  if (!existsSync(join(rootPath, 'index.html'))) return [];
  return [
    ServeStaticModule.forRoot({
      rootPath,
      exclude: ['/api/{*splat}', ...readerRoutePatterns.map((pattern) => `/${pattern}`)],
    }),
  ];
}

/** The benchmark's reference route (`npm run bench`), outside production only. */
function benchModules(): Array<typeof BenchModule> {
  return validateEnv(process.env).NODE_ENV === 'production' ? [] : [BenchModule];
}

/**
 * The pieces every entry point needs: validated configuration, logs and the database.
 * Built as a function so the environment is read when the app is created, not when
 * this file is imported (tests set theirs first).
 */
export function coreImports(): Array<DynamicModule | Promise<DynamicModule>> {
  const env = validateEnv(process.env);
  return [
    ConfigModule.forRoot({
      isGlobal: true,
      // main.ts and the command-line tools load apps/api/.env themselves, before this runs.
      ignoreEnvFile: true,
      validate: validateEnv,
      load: [
        appConfig,
        databaseConfig,
        authConfig,
        mailConfig,
        searchConfig,
        storageConfig,
        publishingConfig,
      ],
    }),
    LoggerModule.forRoot({
      pinoHttp: {
        level: env.LOG_LEVEL,
        redact: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
        autoLogging: { ignore: (request) => request.url === '/api/health' },
      },
    }),
    TypeOrmModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (config: DatabaseConfig) => dataSourceOptions(config),
    }),
  ];
}

@Module({})
export class AppModule {
  static forRoot(): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ...coreImports(),
        ...webModules(),
        ...benchModules(),
        AuditModule,
        MailModule,
        UsersModule,
        AuthModule,
        HealthModule,
        ClaimantsModule,
        ClaimsModule,
        AppearancesModule,
        SourcesModule,
        ReplyAttemptsModule,
        ConsultationsModule,
        CommentsModule,
        AttachmentsModule,
        CalculatorsModule,
        DatasetsModule,
        WorkingsModule,
        ClaimLifeModule,
        RatingsModule,
        VerdictsModule,
        PublishingModule,
        ReaderModule,
        SearchModule,
      ],
      providers: [
        { provide: APP_GUARD, useClass: JwtAuthGuard },
        { provide: APP_GUARD, useClass: RolesGuard },
        { provide: APP_FILTER, useClass: ApiExceptionFilter },
      ],
    };
  }
}
