import { type INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { readerRoutePatterns } from './reader/reader-routes';

/**
 * Everything main.ts sets on the app besides listening, shared with the e2e tests so
 * they run the same API.
 */
export function configureApp(app: INestApplication): INestApplication {
  app.useLogger(app.get(Logger));
  app.setGlobalPrefix('api', { exclude: [...readerRoutePatterns] });
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Inline styles stay allowed for the desk: Radix Themes sets style attributes, and
          // Radix ScrollArea and react-remove-scroll (dialogs) insert <style> elements whose
          // text varies, so neither a hash nor 'self' alone covers them. Script stays 'self'
          // only. Reader pages and stored files get stricter policies of their own
          // (reader/reader-policy.ts, attachments/stored-file-response.ts).
          styleSrc: ["'self'", "'unsafe-inline'"],
          // blob: for previews of evidence files the desk fetches with its token.
          imgSrc: ["'self'", 'data:', 'blob:'],
          frameSrc: ["'self'", 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
        },
      },
      referrerPolicy: { policy: 'no-referrer' },
    }),
  );
  app.use(cookieParser());
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Skyledger API')
      .setDescription("The science desk's API: claims, sources, workings, verdicts and people.")
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
  return app;
}
