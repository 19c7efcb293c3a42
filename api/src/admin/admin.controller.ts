import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Query } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Account, AccountListResponse } from '@peakwise/shared';
import { AccountService } from '../account/account.service.js';
import { AccountListView, AccountView } from '../account/dto/account.view.js';
import { Roles } from '../common/auth.decorators.js';
import { fieldError } from '../common/validation.js';
import { ListAccountsQuery } from './dto/list-accounts.query.js';
import { UpdateRoleDto } from './dto/update-role.dto.js';

/** Account management for admins. Deliberately nothing here reads a baker's logs. */
@ApiTags('admin')
@Roles('admin')
@Controller('admin/accounts')
export class AdminController {
  constructor(private readonly accounts: AccountService) {}

  @Get()
  @ApiOkResponse({ type: AccountListView })
  list(@Query() query: ListAccountsQuery): Promise<AccountListResponse> {
    return this.accounts.list(query.limit, query.offset);
  }

  @Patch(':id/role')
  @ApiOkResponse({ type: AccountView })
  setRole(
    @Param('id', new ParseUUIDPipe({ exceptionFactory: () => fieldError('id', 'Not an account id.') })) id: string,
    @Body() body: UpdateRoleDto,
  ): Promise<Account> {
    return this.accounts.setRole(id, body.role);
  }
}
