import { Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { ProfilesModule } from '../profiles/profiles.module';
import { UsersModule } from '../users/users.module';
import { SitesController } from './sites.controller';
import { SitesRepository } from './sites.repository';
import { SitesService } from './sites.service';

@Module({
  imports: [AdminScopeModule, ProfilesModule, UsersModule],
  controllers: [SitesController],
  providers: [SitesRepository, SitesService],
})
export class SitesModule {}
