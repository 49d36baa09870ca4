import { Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { AdminMailController } from './admin-mail.controller';
import { AdminMailRepository } from './admin-mail.repository';
import { AdminMailService } from './admin-mail.service';

@Module({
  imports: [AdminScopeModule],
  controllers: [AdminMailController],
  providers: [AdminMailRepository, AdminMailService],
})
export class AdminMailModule {}
