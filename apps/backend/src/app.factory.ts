import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { MikroORM } from '@mikro-orm/core';
import { SwaggerModule } from '@nestjs/swagger';
import { buildOpenApiDocument } from './common/answers';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { AppModule, DOMAIN_MODULES } from './app.module';
import { AllExceptionsFilter } from './common/all-exceptions.filter';
import { InputSafetyPipe } from './common/input-safety.pipe';
import { BodyDepthPipe } from './common/body-depth.pipe';
import { BootQuietLogger } from './common/boot-quiet.logger';
import type { AppConfig } from './config/env';
import { FieldValidationPipe } from './common/field-validation.pipe';
import { checkCountedTables } from './common/change-counters';

/**
 * Builds the whole application: used by main.ts, by the API tests and the benchmark,
 * so all of them run exactly what production runs. `domainModules` is AppModule's list
 * unless a test builds the app with the modules in another order.
 */
export async function createApp(
  config: AppConfig,
  domainModules = DOMAIN_MODULES,
): Promise<INestApplication> {
  const app = await NestFactory.create<NestExpressApplication>(
    AppModule.forRoot(config, domainModules),
    {
      bufferLogs: true,
      abortOnError: false,
      // JSON bodies are parsed by JsonBodyMiddleware (AppModule), so their errors reach our filter.
      bodyParser: false,
    },
  );
  app.useLogger(new BootQuietLogger(app.get(Logger)));
  app.set('trust proxy', config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          // The barcode reader's polyfill is ZXing compiled to WebAssembly, served from our
          // own origin; compiling it needs 'wasm-unsafe-eval' (no JavaScript eval is allowed).
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.use(cookieParser());
  app.setGlobalPrefix('api');
  app.useGlobalPipes(
    new InputSafetyPipe(),
    new BodyDepthPipe(),
    new FieldValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }),
  );
  app.useGlobalFilters(new AllExceptionsFilter());
  app.enableShutdownHooks();

  // The response schemas (zod, some megabytes) are loaded by the first request for the
  // document, before Swagger's own handler builds it.
  let components: Record<string, object> | null = null;
  app.use((req: { url: string }, _res: unknown, next: (e?: unknown) => void) => {
    if (components || !req.url.startsWith('/api/docs')) return next();
    import('@gaugeproof/api-types/schemas').then((m) => {
      components = m.openApiComponents();
      next();
    }, next);
  });
  SwaggerModule.setup('api/docs', app, () => buildOpenApiDocument(app, components ?? {}));

  const orm = app.get(MikroORM);
  await orm.getMigrator().up();
  await checkCountedTables(orm.em.fork(), Boolean(config.dbUrl));
  if (config.storage.kind === 'local') {
    const { sweepUploads } = await import('./storage/upload-sweep.js');
    const swept = await sweepUploads(orm.em.fork(), config.uploadDir);
    if (swept.partial + swept.orphans > 0) {
      app
        .get(Logger)
        .log(
          `Swept the upload folder: ${swept.partial} partial and ${swept.orphans} orphan files left by an earlier stop`,
        );
    }
  }
  if (config.seedDemo) {
    // Loaded only when demo data is wanted: it draws its photos with jimp.
    const { seedDemo } = await import('./seed/seed-demo.js');
    await seedDemo(app, config.seedHistory);
  } else {
    // A real start: say so at every start while the published demo sign-ins still work.
    const { openDemoAccounts, demoAccountsWarning } = await import('./seed/demo-accounts.js');
    const open = await openDemoAccounts(orm.em.fork());
    if (open.length > 0) app.get(Logger).warn(demoAccountsWarning(open));
  }
  return app;
}
