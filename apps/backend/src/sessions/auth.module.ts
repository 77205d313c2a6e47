import { Module } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { ThrottlerModule } from '@nestjs/throttler';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { AuthController } from './auth.controller';
import { AuthGuard } from './auth.guard';
import { AuthService } from './auth.service';
import { SignedInUsers } from './signed-in-users';

@Module({
  imports: [
    JwtModule.registerAsync({
      global: true,
      inject: [APP_CONFIG],
      // A KeyObject, not a string: given a string, jsonwebtoken first tries to read it as a
      // public key on every verify and pays for the thrown error (about 2 ms a request).
      useFactory: (config: AppConfig) => ({
        secret: createSecretKey(Buffer.from(config.jwtSecret, 'utf8')),
      }),
    }),
    // Only the sign-in route uses it (LoginThrottlerGuard); in memory, per server. `default`
    // counts one address's tries at one account; `address` all its tries, whatever the
    // account, so guesses spread over many accounts are slowed too (limits from AppConfig).
    ThrottlerModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => [
        { name: 'default', ttl: 60_000, limit: config.signInTries.perAccount },
        {
          name: 'address',
          ttl: 60_000,
          limit: config.signInTries.perAddress,
          getTracker: (req: Record<string, unknown>) => String(req.ip),
        },
      ],
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, SignedInUsers, { provide: APP_GUARD, useClass: AuthGuard }],
})
export class AuthModule {}
