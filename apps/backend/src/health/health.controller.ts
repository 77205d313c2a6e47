import { Answers } from '../common/answers';
import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { EntityManager } from '@mikro-orm/core';
import { Public } from '../auth/decorators';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly em: EntityManager) {}

  @Public()
  @Get()
  @Answers('Health')
  async check() {
    try {
      await this.em.getConnection().execute('select 1 as ok');
    } catch {
      throw new ServiceUnavailableException('The database does not answer');
    }
    return { status: 'ok', database: 'ok', time: new Date().toISOString() };
  }
}
