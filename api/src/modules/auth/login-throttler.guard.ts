import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';

/**
 * Sign-in attempts are counted per address and e-mail: a shared ward tablet does not lock
 * out its colleagues, and guessing one account's password is slowed down.
 */
@Injectable()
export class LoginThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    const body = (req.body ?? {}) as { email?: unknown };
    const email = typeof body.email === 'string' ? body.email.toLowerCase() : '';
    return `${String(req.ip)}|${email}`;
  }
}
