import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { type NestExpressApplication } from '@nestjs/platform-express';
import { Logger } from 'nestjs-pino';
import { AppModule } from './app.module';
import { appConfig, type AppConfig } from './config/configuration';
import { InvalidEnvironmentError } from './config/env.schema';
import { configureApp } from './configure-app';
import { loadEnvFile } from './config/load-env-file';

async function bootstrap(): Promise<void> {
  loadEnvFile();
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(), {
    bufferLogs: true,
  });
  configureApp(app);
  const config = app.get<AppConfig>(appConfig.KEY);
  await app.listen(config.port, config.host);
  app.get(Logger).log(`Skyledger API listening on http://${config.host}:${config.port}`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof InvalidEnvironmentError ? error.message : error);
  process.exit(1);
});
