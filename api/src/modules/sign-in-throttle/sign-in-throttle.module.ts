import { Module } from '@nestjs/common';
import { SignInAttemptsRepository } from './sign-in-attempts.repository';
import { SignInThrottleGuard } from './sign-in-throttle.guard';

@Module({
  providers: [SignInAttemptsRepository, SignInThrottleGuard],
  exports: [SignInAttemptsRepository, SignInThrottleGuard],
})
export class SignInThrottleModule {}
