import { ForbiddenException, Injectable, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import { ACCESS_KEY, type Access, type AuthUser } from './access.js';

/** Global guard: public routes pass, the rest need a valid token and one of the route's roles. */
@Injectable()
export class AccessGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const access = this.reflector.getAllAndOverride<Access | undefined>(ACCESS_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (access === 'public') return true;
    if (!access) throw new ForbiddenException('This route declares no access rule');
    await super.canActivate(context);
    const user = context.switchToHttp().getRequest<Request & { user: AuthUser }>().user;
    if (!access.includes(user.role)) {
      throw new ForbiddenException(`Needs the role ${access.join(' or ')}`);
    }
    return true;
  }
}
