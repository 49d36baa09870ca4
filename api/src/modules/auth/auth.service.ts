import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { LoginRequest, LoginResponse, User } from '@upstroke/contracts';
import bcrypt from 'bcryptjs';
import { DomainError } from '../../common/errors';
import { UsersRepository, type UserWithSites } from '../users/users.repository';

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
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
  ) {}

  async login({ email, password }: LoginRequest): Promise<LoginResponse> {
    const found = await this.users.findByEmail(email);
    const ok = await bcrypt.compare(password, found?.passwordHash ?? decoyHash);
    if (!found || !found.passwordHash || !ok || !found.active) throw badCredentials();
    const user = await this.users.findWithSites(found.id);
    if (!user) throw badCredentials();
    const payload: TokenPayload = { sub: user.id, role: user.role, tv: user.tokenVersion };
    return { accessToken: await this.jwt.signAsync(payload), user: toUser(user) };
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
