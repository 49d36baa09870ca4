import {
  Body,
  Controller,
  Get,
  Headers,
  Param,
  ParseUUIDPipe,
  Patch,
  Post,
  Query,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type BatchResult,
  type CreateResuscitation,
  createResuscitationSchema,
  type DiscardRefused,
  discardRefusedSchema,
  type DiscardResult,
  entriesQuerySchema,
  listResuscitationsQuerySchema,
  type PatchResuscitation,
  patchResuscitationSchema,
  textProblem,
} from '@upstroke/contracts';
import type { Response } from 'express';
import { z } from 'zod';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { badRequest } from '../../common/errors';
import { ZodPipe } from '../../common/zod.pipe';
import { clockOffsetOf } from './clock-offset';
import { ResuscitationsService } from './resuscitations.service';
import { type SyncContext, SyncService } from './sync.service';

const batchOf = (key: string) =>
  new ZodPipe(z.object({ [key]: z.array(z.unknown()).max(5000) }).strict(), { perItem: true });
const uuid = new ParseUUIDPipe({ version: undefined });

function syncContext(deviceId?: string, offset?: string): SyncContext {
  const device = deviceId?.slice(0, 200);
  if (device !== undefined && textProblem(device))
    throw badRequest(`X-Device-Id: ${textProblem(device)}`);
  return { deviceId: device, clockOffsetMs: clockOffsetOf(offset) };
}

@ApiTags('resuscitations')
@ApiBearerAuth()
@Controller('resuscitations')
export class ResuscitationsController {
  constructor(
    private readonly service: ResuscitationsService,
    private readonly sync: SyncService,
  ) {}

  @Roles('recorder', 'lead')
  @Post()
  async create(
    @CurrentUser() user: AuthUser,
    @Body(new ZodPipe(createResuscitationSchema)) body: CreateResuscitation,
    @Headers('x-device-id') deviceId: string | undefined,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { created, record } = await this.service.create(user, body, deviceId);
    res.status(created ? 201 : 200);
    return record;
  }

  @Roles('recorder', 'lead', 'quality')
  @Get()
  list(
    @CurrentUser() user: AuthUser,
    @Query(new ZodPipe(listResuscitationsQuerySchema))
    query: z.infer<typeof listResuscitationsQuerySchema>,
  ) {
    return this.service.list(user, query);
  }

  @Roles('recorder', 'lead', 'quality')
  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string) {
    return this.service.get(user, id);
  }

  @Roles('recorder', 'lead', 'quality')
  @Get(':id/entries')
  entries(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Query(new ZodPipe(entriesQuerySchema)) query: z.infer<typeof entriesQuerySchema>,
  ) {
    return this.service.entries(user, id, query.since);
  }

  @Roles('recorder', 'lead')
  @Patch(':id')
  patch(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(patchResuscitationSchema)) body: PatchResuscitation,
    @Headers('x-device-id') deviceId?: string,
  ) {
    return this.service.patch(user, id, body, deviceId);
  }

  @Roles('recorder', 'lead')
  @Post(':id/events/batch')
  events(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(batchOf('events')) body: { events: unknown[] },
    @Headers('x-device-id') deviceId?: string,
    @Headers('x-clock-offset-ms') offset?: string,
  ): Promise<BatchResult> {
    return this.sync.events(user, id, body.events, syncContext(deviceId, offset));
  }

  @Roles('recorder', 'lead')
  @Post(':id/etco2/batch')
  etco2(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(batchOf('samples')) body: { samples: unknown[] },
    @Headers('x-device-id') deviceId?: string,
    @Headers('x-clock-offset-ms') offset?: string,
  ): Promise<BatchResult> {
    return this.sync.etco2(user, id, body.samples, syncContext(deviceId, offset));
  }

  @Roles('recorder', 'lead')
  @Post(':id/waveform/batch')
  waveform(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(batchOf('chunks')) body: { chunks: unknown[] },
    @Headers('x-device-id') deviceId?: string,
    @Headers('x-clock-offset-ms') offset?: string,
  ): Promise<BatchResult> {
    return this.sync.waveform(user, id, body.chunks, syncContext(deviceId, offset));
  }

  @Roles('lead')
  @Post(':id/discards')
  discard(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Body(new ZodPipe(discardRefusedSchema)) body: DiscardRefused,
  ): Promise<DiscardResult> {
    return this.sync.discard(user, id, body);
  }
}
