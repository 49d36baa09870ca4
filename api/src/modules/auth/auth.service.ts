import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { LoginRequest, LoginResponse, User } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import bcrypt from 'bcryptjs';
import { DomainError } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { AccountsService, type UserWithSites } from '../users/accounts.service';

export interface TokenPayload {
  sub: string;
  role: string;
  tv: number;
}

// Compared against when the e-mail is unknown, so both failures take the same time.
const decoyHash = bcrypt.hashSync('decoy-password-never-valid', 10);
const badCredentials = () =>
  new DomainError(401, 'Unauthorized', 'E-mail or password is not right');

export function toUser(u: UserWithSites): User {
  return { id: u.id, email: u.email, name: u.name, role: u.role, siteIds: u.siteIds };
}

@Injectable()
export class AuthService {
  constructor(
    private readonly users: AccountsService,
    private readonly jwt: JwtService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Every attempt is audited: a success as `sign-in`, a refusal as `sign-in.failed` with the
   * address typed and why (the answer to the caller stays the same for every reason).
   */
  async login({ email, password }: LoginRequest, deviceId?: string): Promise<LoginResponse> {
    const found = await this.users.findByEmail(email);
    const ok = await bcrypt.compare(password, found?.passwordHash ?? decoyHash);
    const reason = !found
      ? 'unknown e-mail'
      : !found.active
        ? 'deactivated'
        : !found.passwordHash
          ? 'no password set'
          : !ok
            ? 'wrong password'
            : null;
    const user = found && reason === null ? await this.users.findWithSites(found.id) : undefined;
    if (!user) {
      await this.record('sign-in.failed', found?.id ?? null, deviceId, {
        email,
        reason: reason ?? 'unknown e-mail',
      });
      throw badCredentials();
    }
    await this.record('sign-in', user.id, deviceId, { email: user.email });
    const payload: TokenPayload = { sub: user.id, role: user.role, tv: user.tokenVersion };
    return { accessToken: await this.jwt.signAsync(payload), user: toUser(user) };
  }

  /** Tokens are not revoked (other tablets stay signed in); the sign-out is audited. */
  signOut(user: AuthUser, deviceId?: string): Promise<void> {
    return this.record('sign-out', user.id, deviceId, { email: user.email });
  }

  private record(
    action: string,
    userId: string | null,
    deviceId: string | undefined,
    details: Record<string, unknown>,
  ): Promise<void> {
    return this.audit.insert({
      userId,
      action,
      entity: 'user',
      entityId: userId,
      deviceId,
      details,
    });
  }

  /** A bearer token's user (for the live feed's WebSocket), or null when it is not valid. */
  async userForAccessToken(token: string): Promise<User | null> {
    try {
      return await this.userForToken(await this.jwt.verifyAsync<TokenPayload>(token));
    } catch {
      return null;
    }
  }

  /** Resolves a token's user; deactivated users and revoked tokens resolve to nothing. */
  async userForToken(payload: TokenPayload): Promise<User | null> {
    const user = await this.users.findWithSites(payload.sub);
    if (!user || !user.active || user.tokenVersion !== payload.tv) return null;
    return toUser(user);
  }
}
