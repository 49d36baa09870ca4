import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Role } from '@upstroke/contracts';
import { type AuthUser, IS_PUBLIC, ROLES } from './auth.decorators';
import { DomainError, forbidden } from './errors';

/** Every route needs a valid token unless marked @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [
      context.getHandler(),
      context.getClass(),
    ]);
    return isPublic ? true : super.canActivate(context);
  }

  override handleRequest<T>(err: unknown, user: T): T {
    if (err || !user) throw new DomainError(401, 'Unauthorized', 'Sign in to continue');
    return user;
  }
}

/** Routes without @Roles() are refused: access is granted explicitly, never by default. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES, targets);
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (!user || !roles || !roles.includes(user.role))
      throw forbidden('Your role does not allow this');
    return true;
  }
}
