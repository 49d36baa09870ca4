import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { RecordingContext } from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { SiteContextService } from './site-context.service';

@ApiTags('context')
@ApiBearerAuth()
@Controller('context')
export class SiteContextController {
  constructor(private readonly service: SiteContextService) {}

  @Roles('recorder', 'lead', 'quality', 'admin')
  @Get()
  get(@CurrentUser() user: AuthUser): Promise<RecordingContext> {
    return this.service.forUser(user);
  }
}
