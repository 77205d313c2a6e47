import { Answers } from '../common/answers';
import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { CreateUserDto } from './dto/create-user.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { UsersService } from './users.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('users')
@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Answers('UserList')
  list() {
    return this.users.list();
  }

  @Post()
  @Answers('User')
  create(@Body() dto: CreateUserDto, @CurrentUser() actor: RequestUser) {
    return this.users.create(dto, actor);
  }

  @Patch(':id')
  @Answers('User')
  update(@IdParam() id: number, @Body() dto: UpdateUserDto, @CurrentUser() actor: RequestUser) {
    return this.users.update(id, dto, actor);
  }
}
