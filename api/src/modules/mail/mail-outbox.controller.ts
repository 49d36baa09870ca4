import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { AdminMailService } from './admin-mail.service';
import { type Page, pageSchema } from './page';

/** `GET /api/mail/outbox`: the delivery queue (admins). */
@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MailOutboxController {
  constructor(private readonly service: AdminMailService) {}

  @Roles('admin')
  @Get('outbox')
  list(@CurrentUser() admin: AuthUser, @Query(new ZodPipe(pageSchema)) page: Page) {
    return this.service.outbox(admin, page.limit, page.offset);
  }
}
