import {
  ForbiddenException,
  Injectable,
  UnauthorizedException,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@peakwise/shared';
import type { FastifyRequest } from 'fastify';
import { AccountRepository, type AccountRecord } from '../account/account.repository.js';
import { IS_PUBLIC, ROLES } from './auth.decorators.js';

/**
 * The global guard: every route needs a signed-in account unless it is marked @Public(), and
 * @Roles() narrows it further. The account is reloaded on each request so a role change or a
 * deleted account takes effect at once.
 */
@Injectable()
export class SessionGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly accounts: AccountRepository,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;

    const request = context.switchToHttp().getRequest<FastifyRequest & { account?: AccountRecord }>();
    const accountId = request.session?.get('accountId');
    const account = accountId ? await this.accounts.findById(accountId) : undefined;
    if (!account) throw new UnauthorizedException('Please sign in.');
    request.account = account;

    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES, targets);
    if (roles && !roles.includes(account.role)) {
      throw new ForbiddenException('Your account does not have access to this.');
    }
    return true;
  }
}
