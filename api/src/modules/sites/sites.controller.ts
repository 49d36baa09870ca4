import { Body, Controller, Get, Headers, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type CreateSite,
  createSiteSchema,
  type List,
  type Site,
  type UnitName,
  unitNameSchema,
  type UpdateSite,
  updateSiteSchema,
} from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { SitesService } from './sites.service';

const uuid = new ParseUUIDPipe({ version: undefined });

@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('sites')
export class SitesController {
  constructor(private readonly service: SitesService) {}

  /** The sites this admin belongs to, with units and the current profile version. */
  @Get()
  list(@CurrentUser() admin: AuthUser): Promise<List<Site>> {
    return this.service.list(admin);
  }

  @Get(':id')
  get(@CurrentUser() admin: AuthUser, @Param('id', uuid) id: string): Promise<Site> {
    return this.service.get(admin, id);
  }

  @Post()
  create(
    @CurrentUser() admin: AuthUser,
    @Body(new ZodPipe(createSiteSchema)) body: CreateSite,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Site> {
    return this.service.create(admin, body, deviceId);
  }

  @Patch(':id')
  update(
    @CurrentUser() admin: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(updateSiteSchema)) body: UpdateSite,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Site> {
    return this.service.update(admin, id, body, deviceId);
  }

  @Post(':id/units')
  addUnit(
    @CurrentUser() admin: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(unitNameSchema)) body: UnitName,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Site> {
    return this.service.addUnit(admin, id, body, deviceId);
  }

  @Patch(':id/units/:unitId')
  renameUnit(
    @CurrentUser() admin: AuthUser,
    @Param('id', uuid) id: string,
    @Param('unitId', uuid) unitId: string,
    @Body(new ZodPipe(unitNameSchema)) body: UnitName,
    @Headers('x-device-id') deviceId?: string,
  ): Promise<Site> {
    return this.service.renameUnit(admin, id, unitId, body, deviceId);
  }
}
