import { Answers } from '../common/answers';
import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ALL_ROLES } from '../auth/roles';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { UpdateNoticeSettingsDto } from './dto/update-notice-settings.dto';
import { NoticesService } from './notices.service';

/** The signed-in user's own e-mail notices (the profile page). */
@ApiTags('notices')
@Controller('me/notices')
@Roles(...ALL_ROLES)
export class NoticesController {
  constructor(private readonly notices: NoticesService) {}

  @Get()
  @Answers('NoticeSettings')
  mine(@CurrentUser() actor: RequestUser) {
    return this.notices.mine(actor);
  }

  @Patch()
  @Answers('NoticeSettings')
  update(@Body() dto: UpdateNoticeSettingsDto, @CurrentUser() actor: RequestUser) {
    return this.notices.update(actor, dto);
  }
}
