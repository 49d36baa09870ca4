import { createParamDecorator, type ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '@upstroke/contracts';

export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  siteIds: string[];
}

export const IS_PUBLIC = 'isPublic';
export const ROLES = 'roles';

/** The route needs no token (sign-in, health, the monitor simulator). */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** Only these roles may call the route. Every non-public route must say which. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES, roles);

export const CurrentUser = createParamDecorator(
  (_: unknown, ctx: ExecutionContext): AuthUser =>
    ctx.switchToHttp().getRequest<{ user: AuthUser }>().user,
);

export function canSeeSite(user: AuthUser, siteId: string): boolean {
  return user.siteIds.includes(siteId);
}
