import { Body, Controller, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type SendDebriefEmail, sendDebriefEmailSchema } from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { DebriefMailService } from './debrief-mail.service';

const uuid = new ParseUUIDPipe({ version: undefined });

@ApiTags('mail')
@ApiBearerAuth()
@Controller()
export class DebriefMailController {
  constructor(private readonly service: DebriefMailService) {}

  @Roles('lead')
  @Post('resuscitations/:id/email')
  @HttpCode(202)
  send(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(sendDebriefEmailSchema)) body: SendDebriefEmail,
  ) {
    return this.service.send(user, id, body);
  }
}
