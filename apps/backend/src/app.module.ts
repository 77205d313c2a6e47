import { SupplierPortalModule } from './supplier-portal/supplier-portal.module';
import {
  DynamicModule,
  Module,
  RequestMethod,
  type Type,
  type MiddlewareConsumer,
  type NestModule,
} from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { ServeStaticModule } from '@nestjs/serve-static';
import { LoggerModule } from 'nestjs-pino';
import { existsSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import type { IncomingMessage } from 'node:http';
import { AuditModule } from './audit/audit.module';
import { AuditTrailModule } from './audit-trail/audit-trail.module';
import { AuthModule } from './sessions/auth.module';
import { ConfigModule } from './config/config.module';
import { ClockModule } from './common/clock';
import { ServerLockHolder } from './ops/server-lock.holder';
import { CorrectiveActionsModule } from './corrective-actions/corrective-actions.module';
import { ExportsModule } from './exports/exports.module';
import { DecisionsModule } from './decisions/decisions.module';
import { DocumentsModule } from './documents/documents.module';
import { MailModule } from './mail/mail.module';
import { NoticesModule } from './notices/notices.module';
import { ReturnsModule } from './returns/returns.module';
import type { AppConfig } from './config/env';
import { JsonBodyMiddleware } from './common/json-body.middleware';
import { RouteOrder } from './common/route-order';
import { ormOptions } from './database/orm-options';
import { HealthModule } from './health/health.module';
import { UsersModule } from './users/users.module';
import { InspectionModule } from './inspection/inspection.module';
import { PhotosModule } from './photos/photos.module';
import { StorageModule } from './storage/storage.module';
import { ScorecardsModule } from './scorecards/scorecards.module';
import { InstrumentsModule } from './instruments/instruments.module';
import { SuppliersModule } from './suppliers/suppliers.module';
import { ProductsModule } from './products/products.module';
import { LotsModule } from './lots/lots.module';
import { LotPageModule } from './lot-page/lot-page.module';

/**
 * Domain modules; each later domain adds its module here. Their order decides no route: a
 * literal route goes before a parameter route that would take it, whichever module added
 * them (`common/route-order.ts`; test/routes.e2e-spec.ts builds the app with the modules
 * reversed and compares the answers).
 */
export const DOMAIN_MODULES: readonly Type[] = [
  AuditModule,
  AuditTrailModule,
  AuthModule,
  UsersModule,
  HealthModule,
  InstrumentsModule,
  SuppliersModule,
  ProductsModule,
  LotsModule,
  InspectionModule,
  LotPageModule,
  StorageModule,
  PhotosModule,
  ScorecardsModule,
  DecisionsModule,
  DocumentsModule,
  MailModule,
  NoticesModule,
  ReturnsModule,
  ExportsModule,
  CorrectiveActionsModule,
  SupplierPortalModule,
];

function requestId(req: IncomingMessage): string {
  const given = req.headers['x-request-id'];
  return typeof given === 'string' && /^[\w-]{8,64}$/.test(given) ? given : randomUUID();
}

/**
 * Vite names every built file under `assets/` by a hash of its content, so a browser may
 * keep it for good; the page itself, the service worker and the rest are asked again each
 * time (`no-cache`: kept, but checked). Without this every chunk of a screen was checked
 * (304) on every visit, about sixty requests in turn on one host before the Lot page could
 * draw (measured in headless Chromium on the 10 000-lot bench set: `npm run bench`).
 */
export function staticCacheHeaders(
  res: { setHeader(name: string, value: string): void },
  path: string,
) {
  const hashed = /[\\/]assets[\\/][^\\/]+-[\w-]{8}\.(js|css|woff2?|wasm|svg|png)$/.test(path);
  res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
}

@Module({})
export class AppModule implements NestModule {
  /** Runs after the modules' own middleware (request id, logger, ORM context): Nest orders by depth. */
  configure(consumer: MiddlewareConsumer) {
    consumer.apply(JsonBodyMiddleware).forRoutes({ path: '{*splat}', method: RequestMethod.ALL });
  }

  static forRoot(config: AppConfig, domainModules = DOMAIN_MODULES): DynamicModule {
    const staticSite = existsSync(config.frontendDist)
      ? [
          ServeStaticModule.forRoot({
            rootPath: config.frontendDist,
            exclude: ['/api/{*rest}'],
            serveStaticOptions: { setHeaders: staticCacheHeaders },
          }),
        ]
      : [];
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(config),
        ClockModule,
        DiscoveryModule,
        LoggerModule.forRoot({
          forRoutes: [{ path: '{*splat}', method: RequestMethod.ALL }],
          pinoHttp: {
            level: config.logLevel,
            genReqId: requestId,
            // On every line, given once: a per-request `customProps` made each request build
            // one more child logger (about 2 % of a lot-list request).
            base: { pid: process.pid, hostname: hostname(), app: 'gaugeproof' },
            redact: [
              'req.headers.authorization',
              'req.headers.cookie',
              'res.headers["set-cookie"]',
            ],
            autoLogging: { ignore: (req) => req.url === '/api/health' },
          },
        }),
        MikroOrmModule.forRoot(ormOptions(config)),
        ...domainModules,
        ...staticSite,
      ],
      providers: [ServerLockHolder, RouteOrder],
    };
  }
}
