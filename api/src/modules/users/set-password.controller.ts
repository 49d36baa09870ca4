import { Body, Controller, Headers, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type SetPassword, setPasswordSchema } from '@upstroke/contracts';
import { Public } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { SignInThrottleGuard } from '../sign-in-throttle/sign-in-throttle.guard';
import { InvitationsService } from './invitations.service';

/** The public end of an invitation or reset link. */
@ApiTags('auth')
@Controller('auth')
export class SetPasswordController {
  constructor(private readonly invitations: InvitationsService) {}

  @Public()
  @UseGuards(SignInThrottleGuard)
  @Post('set-password')
  @HttpCode(200)
  setPassword(
    @Body(new ZodPipe(setPasswordSchema)) body: SetPassword,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<{ email: string }> {
    return this.invitations.setPassword(body, deviceId);
  }
}
