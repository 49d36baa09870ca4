import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { DomainError } from '../../common/errors';
import { SignInAttemptsRepository } from './sign-in-attempts.repository';

const tooMany = () =>
  new DomainError(
    429,
    'Too Many Requests',
    'Too many sign-in attempts: wait a minute and try again',
  );

/**
 * Sign-in (and set-password) attempts are limited per minute both per network address,
 * whatever the e-mail, and per e-mail, whatever the address: spraying many e-mails from
 * one address or one e-mail from many addresses is slowed down alike. The address is
 * Express's `req.ip`, which believes X-Forwarded-For only from TRUST_PROXY.
 */
@Injectable()
export class SignInThrottleGuard implements CanActivate {
  constructor(
    private readonly attempts: SignInAttemptsRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const req = ctx.switchToHttp().getRequest<{ ip?: string; body?: { email?: unknown } }>();
    const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
    const byAddress = `ip:${req.ip ?? 'unknown'}`;
    const byEmail = `email:${email}`;
    const counts = await this.attempts.recordAndCount(
      email ? [byAddress, byEmail] : [byAddress],
      60,
    );
    if (counts[byAddress] >= this.config.loginIpLimitPerMinute) throw tooMany();
    if (email && counts[byEmail] >= this.config.loginLimitPerMinute) throw tooMany();
    return true;
  }
}
