import { Module } from '@nestjs/common';
import { AdminMailController } from './admin-mail.controller';
import { AdminMailRepository } from './admin-mail.repository';
import { AdminMailService } from './admin-mail.service';

@Module({
  controllers: [AdminMailController],
  providers: [AdminMailRepository, AdminMailService],
})
export class AdminMailModule {}
