import { Body, Controller, Get, HttpCode, Ip, Post } from '@nestjs/common';
import type { PublicUser } from '../users/public-user.js';
import { AnyRole, Public, type AuthUser } from './access.js';
import { AuthService, type SessionTokens } from './auth.service.js';
import { CurrentUser } from './current-user.decorator.js';
import { LoginDto } from './dto/login.dto.js';
import { RefreshDto } from './dto/refresh.dto.js';

@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('login')
  @Public()
  @HttpCode(200)
  login(@Body() body: LoginDto, @Ip() address: string): Promise<SessionTokens> {
    return this.auth.login(body.email, body.password, body.deviceId, address);
  }

  @Post('refresh')
  @Public()
  @HttpCode(200)
  refresh(@Body() body: RefreshDto): Promise<SessionTokens> {
    return this.auth.refresh(body.refreshToken);
  }

  /** Public because the access token may already have expired when someone signs out. */
  @Post('logout')
  @Public()
  @HttpCode(204)
  logout(@Body() body: RefreshDto): Promise<void> {
    return this.auth.logout(body.refreshToken);
  }

  @Get('me')
  @AnyRole()
  me(@CurrentUser() user: AuthUser): PublicUser {
    const { id, name, email, role } = user;
    return { id, name, email, role, active: true };
  }
}
