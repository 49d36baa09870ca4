import { Module } from '@nestjs/common';
import { InvitationsRepository } from './invitations.repository';
import { InvitationsService } from './invitations.service';
import { SetPasswordController } from './set-password.controller';
import { UsersController } from './users.controller';
import { UsersRepository } from './users.repository';
import { UsersService } from './users.service';

@Module({
  controllers: [UsersController, SetPasswordController],
  providers: [UsersRepository, InvitationsRepository, InvitationsService, UsersService],
  exports: [UsersRepository],
})
export class UsersModule {}
