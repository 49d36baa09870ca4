import { Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { SignInThrottleModule } from '../sign-in-throttle/sign-in-throttle.module';
import { AccountsService } from './accounts.service';
import { InvitationsRepository } from './invitations.repository';
import { InvitationsService } from './invitations.service';
import { SetPasswordController } from './set-password.controller';
import { UsersController } from './users.controller';
import { UsersRepository } from './users.repository';
import { UsersService } from './users.service';

@Module({
  imports: [AdminScopeModule, SignInThrottleModule],
  controllers: [UsersController, SetPasswordController],
  providers: [
    UsersRepository,
    InvitationsRepository,
    InvitationsService,
    UsersService,
    AccountsService,
  ],
  exports: [AccountsService],
})
export class UsersModule {}
