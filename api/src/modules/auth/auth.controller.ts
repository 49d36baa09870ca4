import { Body, Controller, Get, Headers, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type LoginRequest, loginRequestSchema, type LoginResponse } from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Public, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { AuthService } from './auth.service';
import { SignInThrottleGuard } from '../sign-in-throttle/sign-in-throttle.guard';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @UseGuards(SignInThrottleGuard)
  @Post('login')
  @HttpCode(200)
  login(
    @Body(new ZodPipe(loginRequestSchema)) body: LoginRequest,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<LoginResponse> {
    return this.auth.login(body, deviceId);
  }

  @ApiBearerAuth()
  @Roles('recorder', 'lead', 'quality', 'admin')
  @Post('logout')
  @HttpCode(204)
  logout(@CurrentUser() user: AuthUser, @Headers('x-device-id') deviceId?: string): Promise<void> {
    return this.auth.signOut(user, deviceId);
  }

  @ApiBearerAuth()
  @Roles('recorder', 'lead', 'quality', 'admin')
  @Get('me')
  me(@CurrentUser() user: AuthUser): AuthUser {
    return user;
  }
}
