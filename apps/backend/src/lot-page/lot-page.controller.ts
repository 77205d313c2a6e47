import { Answers } from '../common/answers';
import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators';
import { ALL_ROLES } from '../auth/roles';
import { LotPageService } from './lot-page.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('lots')
@Controller('lots')
export class LotPageController {
  constructor(private readonly lots: LotPageService) {}

  @Get(':id')
  @Answers('LotDetail')
  @Roles(...ALL_ROLES)
  detail(@IdParam() id: number) {
    return this.lots.detail(id);
  }
}
