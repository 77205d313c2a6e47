import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import bcrypt from 'bcryptjs';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { CreateUserDto } from './dto/create-user.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { User } from './entities/user.entity';
import { versionedEdit } from '../common/versioned-edit';

export function publicUser(u: User) {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    active: u.active,
    createdAt: u.createdAt,
    version: u.version,
  };
}

@Injectable()
export class UsersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list() {
    const users = await this.em.find(User, {}, { orderBy: { name: 'asc' } });
    return users.map(publicUser);
  }

  async create(dto: CreateUserDto, actor: RequestUser) {
    const email = dto.email.trim().toLowerCase();
    if (await this.em.count(User, { email })) {
      throw DomainError.conflict(`A user with e-mail ${email} already exists`, 'email');
    }
    const user = this.em.create(User, {
      email,
      name: dto.name.trim(),
      role: dto.role,
      passwordHash: await bcrypt.hash(dto.password, 10),
      active: true,
    });
    this.em.persist(user);
    await this.em.flush();
    this.audit.record(this.em, actor, {
      action: 'user.create',
      entityType: 'user',
      entityId: user.id,
      after: publicUser(user),
    });
    await this.em.flush();
    return publicUser(user);
  }

  async update(id: number, dto: UpdateUserDto, actor: RequestUser) {
    if (id === actor.id && (dto.active === false || (dto.role && dto.role !== 'admin'))) {
      throw DomainError.refused(
        'You cannot deactivate your own account or take away your own admin role',
      );
    }
    // Hashed before the transaction: bcrypt takes a while and needs nothing from it.
    const passwordHash =
      dto.password === undefined ? undefined : await bcrypt.hash(dto.password, 10);
    return versionedEdit(this.em, {
      version: dto.version,
      load: (em) => em.findOneOrFail(User, { id }),
      view: (_em, user) => publicUser(user),
      name: (user) => `the account of ${user.email}`,
      change: async (em, user) => {
        const before = publicUser(user);
        if (dto.name !== undefined) user.name = dto.name.trim();
        if (dto.role !== undefined) user.role = dto.role;
        if (dto.active !== undefined) user.active = dto.active;
        if (passwordHash !== undefined) user.passwordHash = passwordHash;
        // A new password, another role or a deactivation ends the account's sessions everywhere.
        if (
          passwordHash !== undefined ||
          user.role !== before.role ||
          user.active !== before.active
        ) {
          user.sessionVersion += 1;
        }
        await em.flush();
        const after = publicUser(user);
        this.audit.record(em, actor, {
          action: passwordHash !== undefined ? 'user.update+password' : 'user.update',
          entityType: 'user',
          entityId: user.id,
          before,
          after,
        });
        await em.flush();
        return after;
      },
    });
  }
}
