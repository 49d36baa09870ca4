import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { DomainError } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { SignInAttemptsRepository } from './sign-in-attempts.repository';

const WINDOW_SEC = 60;

const tooMany = () =>
  new DomainError(
    429,
    'Too Many Requests',
    'Too many sign-in attempts: wait a minute and try again',
  );

interface ThrottledRequest {
  ip?: string;
  path?: string;
  body?: { email?: unknown };
  headers?: Record<string, string | string[] | undefined>;
}

/**
 * Sign-in (and set-password) attempts are limited per minute both per network address,
 * whatever the e-mail, and per e-mail, whatever the address: spraying many e-mails from
 * one address or one e-mail from many addresses is slowed down alike. The address is
 * Express's `req.ip`, which believes X-Forwarded-For only from TRUST_PROXY.
 *
 * A refusal is audited (`sign-in.throttled`) once per key each time it goes over its limit:
 * only the attempt that finds exactly the limit before it within the minute writes an entry.
 * Refused attempts still count, so a flood stays over the limit and adds no further entries
 * until it has paused for a whole minute.
 */
@Injectable()
export class SignInThrottleGuard implements CanActivate {
  constructor(
    private readonly attempts: SignInAttemptsRepository,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const req = ctx.switchToHttp().getRequest<ThrottledRequest>();
    const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
    const limits = new Map([[`ip:${req.ip ?? 'unknown'}`, this.config.loginIpLimitPerMinute]]);
    if (email) limits.set(`email:${email}`, this.config.loginLimitPerMinute);
    const counts = await this.attempts.recordAndCount([...limits.keys()], WINDOW_SEC);
    const over = [...limits].filter(([key, limit]) => counts[key] >= limit);
    if (over.length === 0) return true;
    for (const [key, limit] of over) if (counts[key] === limit) await this.audited(req, key, limit);
    throw tooMany();
  }

  private audited(req: ThrottledRequest, key: string, limit: number): Promise<void> {
    const device = req.headers?.['x-device-id'];
    const [kind, value] = [key.slice(0, key.indexOf(':')), key.slice(key.indexOf(':') + 1)];
    return this.audit.insert({
      userId: null,
      action: 'sign-in.throttled',
      entity: 'user',
      deviceId: typeof device === 'string' ? device : null,
      details: {
        [kind === 'ip' ? 'address' : 'email']: value,
        limitPerMinute: limit,
        path: req.path ?? null,
      },
    });
  }
}
