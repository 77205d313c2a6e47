import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { EntityManager, raw } from '@mikro-orm/core';
import bcrypt from 'bcryptjs';
import { User } from '../users/entities/user.entity';
import type { RequestUser } from '../auth/request-user';
import { signSession } from './session-tokens';

/** A real hash, so an unknown e-mail costs the same time as a wrong password. */
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 10);
const WRONG = 'E-mail or password is not right';

@Injectable()
export class AuthService {
  constructor(
    private readonly em: EntityManager,
    private readonly jwt: JwtService,
  ) {}

  async login(email: string, password: string) {
    const user = await this.em.findOne(
      User,
      { email: email.trim().toLowerCase() },
      { populate: ['passwordHash'] },
    );
    const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok || !user.active) throw new UnauthorizedException(WRONG);
    const accessToken = await signSession(this.jwt, user);
    const publicUser: RequestUser = {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
    };
    return { accessToken, user: publicUser };
  }

  /** Ends every session of the account, on every server (the guard compares versions). */
  async logout(userId: number) {
    await this.em.nativeUpdate(
      User,
      { id: userId },
      { sessionVersion: raw('session_version + 1') },
    );
  }
}
