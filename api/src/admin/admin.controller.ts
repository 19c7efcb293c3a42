import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Query } from '@nestjs/common';
import { ApiConflictResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Account, AccountListResponse, AdminAccount } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AccountService } from '../account/account.service.js';
import { AccountListView, AccountView, AdminAccountView } from '../account/dto/account.view.js';
import { CurrentAccount, Roles } from '../common/auth.decorators.js';
import { fieldError } from '../common/validation.js';
import { ListAccountsQuery } from './dto/list-accounts.query.js';
import { UpdateRoleDto } from './dto/update-role.dto.js';
import { UpdateStatusDto } from './dto/update-status.dto.js';

const accountId = () => new ParseUUIDPipe({ exceptionFactory: () => fieldError('id', 'Not an account id.') });

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
  setRole(@Param('id', accountId()) id: string, @Body() body: UpdateRoleDto): Promise<Account> {
    return this.accounts.setRole(id, body.role);
  }

  @Patch(':id/status')
  @ApiOkResponse({ type: AdminAccountView, description: 'Disabling ends every session of the account at once' })
  @ApiConflictResponse({ description: 'An admin cannot disable their own account' })
  setStatus(
    @CurrentAccount() admin: AccountRecord,
    @Param('id', accountId()) id: string,
    @Body() body: UpdateStatusDto,
  ): Promise<AdminAccount> {
    return this.accounts.setDisabled(admin, id, body.disabled);
  }
}
