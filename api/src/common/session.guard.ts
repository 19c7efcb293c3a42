import {
  ForbiddenException,
  Injectable,
  UnauthorizedException,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@peakwise/shared';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { AccountRepository, type AccountRecord } from '../account/account.repository.js';
import { IS_PUBLIC, ROLES } from './auth.decorators.js';

export const ACCOUNT_DISABLED_SESSION = 'This account has been disabled, so you have been signed out.';

/**
 * The global guard: every route needs a signed-in account unless it is marked @Public(), and
 * @Roles() narrows it further. The account is reloaded on each request so a role change, a
 * disabled or deleted account, or a password change elsewhere (session epoch) takes effect at once.
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
    const ended = (request.session.get('sessionEpoch') ?? 0) !== account.sessionEpoch;
    if (ended || account.disabledAt) {
      // Destroyed here, or the rolling save at the end of this request would write it back.
      await request.session.destroy();
      void context.switchToHttp().getResponse<FastifyReply>().clearCookie('peakwise.sid', { path: '/' });
      // Disabling deleted the other session rows; one a request under way saved back ends here.
      if (account.disabledAt) throw new UnauthorizedException(ACCOUNT_DISABLED_SESSION);
      throw new UnauthorizedException('Please sign in.');
    }
    request.account = account;

    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES, targets);
    if (roles && !roles.includes(account.role)) {
      throw new ForbiddenException('Your account does not have access to this.');
    }
    return true;
  }
}
