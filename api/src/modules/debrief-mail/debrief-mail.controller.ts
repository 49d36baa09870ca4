import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type SendDebriefEmail, sendDebriefEmailSchema } from '@upstroke/contracts';
import { z } from 'zod';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { AdminScopeRepository } from '../admin-scope/admin-scope.repository';
import { DebriefMailService } from './debrief-mail.service';
import { OutboxRepository } from './outbox.repository';

const uuid = new ParseUUIDPipe({ version: undefined });
const pageSchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});

@ApiTags('mail')
@ApiBearerAuth()
@Controller()
export class DebriefMailController {
  constructor(
    private readonly service: DebriefMailService,
    private readonly outbox: OutboxRepository,
    private readonly scope: AdminScopeRepository,
  ) {}

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

  /** The delivery queue, newest first, without bodies or attachments (admins). */
  @Roles('admin')
  @Get('mail/outbox')
  async list(
    @CurrentUser() admin: AuthUser,
    @Query(new ZodPipe(pageSchema)) page: z.infer<typeof pageSchema>,
  ) {
    const scope = await this.scope.scopeOf(admin);
    const { items, total } = await this.outbox.list(scope, page.limit, page.offset);
    return {
      items: items.map((r) => ({
        ...r,
        nextAttemptAt: r.nextAttemptAt.toISOString(),
        sentAt: r.sentAt ? r.sentAt.toISOString() : null,
        createdAt: r.createdAt.toISOString(),
      })),
      total,
    };
  }
}
