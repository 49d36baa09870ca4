import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { SerialIdPipe } from '../../common/serial-id.pipe';
import { ZodPipe } from '../../common/zod.pipe';
import { AdminMailService } from './admin-mail.service';
import { type Page, pageSchema } from './page';

/** The mail viewer: what the local sink received, and the delivery queue's state. */
@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('admin/mail')
export class AdminMailController {
  constructor(private readonly service: AdminMailService) {}

  @Get()
  list(@CurrentUser() admin: AuthUser, @Query(new ZodPipe(pageSchema)) page: Page) {
    return this.service.overview(admin, page.limit, page.offset);
  }

  @Get(':id')
  get(@CurrentUser() admin: AuthUser, @Param('id', SerialIdPipe) id: number) {
    return this.service.message(admin, id);
  }
}
