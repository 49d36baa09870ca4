import {
  Body,
  Controller,
  Get,
  Headers,
  HttpCode,
  Param,
  ParseUUIDPipe,
  Post,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type Amendment,
  type CreateAmendment,
  createAmendmentSchema,
  type Debrief,
  type Resuscitation,
} from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { DebriefService } from './debrief.service';
import { SigningService } from './signing.service';

const uuid = new ParseUUIDPipe({ version: undefined });

@ApiTags('debrief')
@ApiBearerAuth()
@Controller('resuscitations/:id')
export class DebriefController {
  constructor(
    private readonly debrief: DebriefService,
    private readonly signing: SigningService,
  ) {}

  @Roles('recorder', 'lead', 'quality')
  @Get('debrief')
  get(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string): Promise<Debrief> {
    return this.debrief.forUser(user, id);
  }

  @Roles('lead')
  @Post('sign')
  @HttpCode(200)
  sign(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Resuscitation> {
    return this.signing.sign(user, id, deviceId?.slice(0, 200));
  }

  @Roles('lead')
  @Post('amendments')
  amend(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(createAmendmentSchema)) body: CreateAmendment,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Amendment> {
    return this.signing.amend(user, id, body, deviceId?.slice(0, 200));
  }
}
