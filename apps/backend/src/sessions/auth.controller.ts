import { Answers } from '../common/answers';
import { Body, Controller, Get, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { AuthService } from './auth.service';
import { CurrentUser, Public, Roles } from '../auth/decorators';
import { LoginDto } from './dto/login.dto';
import { LoginThrottlerGuard } from './login-throttler.guard';
import { SESSION_COOKIE, SESSION_IDLE_MINUTES, type RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('login')
  @Answers('LoginAnswer')
  @HttpCode(200)
  @UseGuards(LoginThrottlerGuard)
  async login(
    @Body() dto: LoginDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ) {
    const result = await this.auth.login(dto.email, dto.password);
    res.cookie(SESSION_COOKIE, result.accessToken, {
      httpOnly: true,
      sameSite: 'strict',
      secure: req.secure,
      path: '/',
      maxAge: SESSION_IDLE_MINUTES * 60 * 1000,
    });
    return result;
  }

  @Roles(...ALL_ROLES)
  @Get('me')
  @Answers('SessionUser')
  me(@CurrentUser() user: RequestUser) {
    return user;
  }

  @Roles(...ALL_ROLES)
  @Post('logout')
  @Answers.empty()
  @HttpCode(204)
  async logout(@CurrentUser() user: RequestUser, @Res({ passthrough: true }) res: Response) {
    await this.auth.logout(user.id);
    res.clearCookie(SESSION_COOKIE, { path: '/', httpOnly: true, sameSite: 'strict' });
  }
}
