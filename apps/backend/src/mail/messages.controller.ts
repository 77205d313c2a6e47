import { Answers } from '../common/answers';
import { Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ListMessagesDto } from './dto/list-messages.dto';
import { MailService } from './mail.service';
import { IdPipe } from '../common/id.pipe';

@ApiTags('messages')
@Controller('messages')
@Roles('purchasing', 'admin')
export class MessagesController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @Answers('OutboundMessagePage')
  list(@Query() q: ListMessagesDto) {
    return this.mail.list(q);
  }

  /** Sends a failed (or only logged) message again, its attachments rebuilt. */
  @Post(':id/retry')
  @Answers('OutboundMessage')
  @HttpCode(200)
  retry(@Param('id', IdPipe) id: number, @CurrentUser() actor: RequestUser) {
    return this.mail.retry(id, actor);
  }
}
