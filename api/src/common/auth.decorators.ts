import { SetMetadata, createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { Role } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';

export const IS_PUBLIC = 'peakwise:isPublic';
export const ROLES = 'peakwise:roles';

/** Opts a route out of the global sign-in guard. Everything else needs a session. */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** Restricts a route to the listed roles (on top of being signed in). */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES, roles);

/** The signed-in account, loaded by the session guard. */
export const CurrentAccount = createParamDecorator((_: unknown, ctx: ExecutionContext): AccountRecord => {
  const request = ctx.switchToHttp().getRequest<{ account?: AccountRecord }>();
  if (!request.account) throw new Error('CurrentAccount used on a route without the session guard');
  return request.account;
});
