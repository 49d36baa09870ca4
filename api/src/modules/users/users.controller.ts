import { Body, Controller, Get, Headers, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type AdminUser,
  type InviteUser,
  inviteUserSchema,
  type List,
  type UpdateUser,
  updateUserSchema,
} from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { UsersService } from './users.service';

const uuid = new ParseUUIDPipe({ version: undefined });

@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly service: UsersService) {}

  @Get()
  list(@CurrentUser() admin: AuthUser): Promise<List<AdminUser>> {
    return this.service.list(admin);
  }

  /** Creates the account and e-mails a one-time link to set its password. */
  @Post()
  invite(
    @CurrentUser() admin: AuthUser,
    @Body(new ZodPipe(inviteUserSchema)) body: InviteUser,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<AdminUser> {
    return this.service.invite(admin, body, deviceId);
  }

  @Patch(':id')
  update(
    @CurrentUser() admin: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(updateUserSchema)) body: UpdateUser,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<AdminUser> {
    return this.service.update(admin, id, body, deviceId);
  }

  @Post(':id/reset-password')
  resetPassword(
    @CurrentUser() admin: AuthUser,
    @Param('id', uuid) id: string,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<AdminUser> {
    return this.service.resetPassword(admin, id, deviceId);
  }
}
