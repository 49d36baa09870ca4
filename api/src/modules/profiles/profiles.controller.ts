import { Body, Controller, Get, Headers, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type CreateProfileVersion,
  createProfileVersionSchema,
  type List,
  type ProtocolProfile,
} from '@upstroke/contracts';
import { z } from 'zod';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { ProfilesService } from './profiles.service';

const uuid = new ParseUUIDPipe({ version: undefined });
const listQuerySchema = z.object({ siteId: z.uuid().optional() }).strict();

@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('protocol-profiles')
export class ProfilesController {
  constructor(private readonly service: ProfilesService) {}

  /** Every version of the admin's sites (or of one site), newest first. */
  @Get()
  list(
    @CurrentUser() admin: AuthUser,
    @Query(new ZodPipe(listQuerySchema)) query: z.infer<typeof listQuerySchema>,
  ): Promise<List<ProtocolProfile>> {
    return this.service.list(admin, query.siteId);
  }

  @Get(':id')
  get(@CurrentUser() admin: AuthUser, @Param('id', uuid) id: string): Promise<ProtocolProfile> {
    return this.service.get(admin, id);
  }

  /** Saves a new version; existing versions are never changed. */
  @Post()
  create(
    @CurrentUser() admin: AuthUser,
    @Body(new ZodPipe(createProfileVersionSchema)) body: CreateProfileVersion,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<ProtocolProfile> {
    return this.service.create(admin, body, deviceId);
  }
}
