import {
  ForbiddenException,
  Injectable,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { roleLabels, type Role } from '@skyledger/contracts';
import { type Request } from 'express';
import { type AuthenticatedUser } from '../../auth/authenticated-user';
import { ROLES_KEY } from '../decorators/roles.decorator';

/** Registered globally after the JWT guard; enforces `@Roles(...)` where it is set. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const allowed = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!allowed || allowed.length === 0) return true;
    const user = context.switchToHttp().getRequest<Request & { user?: AuthenticatedUser }>().user;
    if (user && allowed.includes(user.role)) return true;
    throw new ForbiddenException(
      `Only ${allowed.map((role) => roleLabels[role].toLowerCase()).join(' or ')} may do this`,
    );
  }
}
