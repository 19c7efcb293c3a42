import { Body, Controller, Get, HttpCode, Patch, Post, Req } from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Account } from '@peakwise/shared';
import type { FastifyRequest } from 'fastify';
import { CurrentAccount } from '../common/auth.decorators.js';
import { toAccount } from './account.mapper.js';
import type { AccountRecord } from './account.repository.js';
import { AccountService } from './account.service.js';
import { AccountView } from './dto/account.view.js';
import { ChangePasswordDto } from './dto/change-password.dto.js';
import { UpdateAccountDto } from './dto/update-account.dto.js';

@ApiTags('account')
@Controller('account')
export class AccountController {
  constructor(private readonly service: AccountService) {}

  @Get()
  @ApiOkResponse({ type: AccountView, description: 'The signed-in account' })
  get(@CurrentAccount() account: AccountRecord): Account {
    return toAccount(account);
  }

  @Patch()
  @ApiOkResponse({ type: AccountView })
  update(@CurrentAccount() account: AccountRecord, @Body() body: UpdateAccountDto): Promise<Account> {
    return this.service.update(account, body);
  }

  @Post('password')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Changed; other devices are signed out' })
  async changePassword(
    @CurrentAccount() account: AccountRecord,
    @Body() body: ChangePasswordDto,
    @Req() req: FastifyRequest,
  ): Promise<void> {
    const epoch = await this.service.changePassword(account, body, req.session.sessionId);
    req.session.set('sessionEpoch', epoch);
  }
}
