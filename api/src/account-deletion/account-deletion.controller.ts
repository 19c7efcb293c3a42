import { Body, Controller, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiBadRequestResponse, ApiNoContentResponse, ApiTags } from '@nestjs/swagger';
import type { FastifyReply, FastifyRequest } from 'fastify';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { AccountDeletionService } from './account-deletion.service.js';
import { DeleteAccountDto } from './dto/delete-account.dto.js';

@ApiTags('account')
@Controller('account')
export class AccountDeletionController {
  constructor(private readonly service: AccountDeletionService) {}

  @Post('delete')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The account and everything it logged are gone; signed out' })
  @ApiBadRequestResponse({ description: '`password` when it is not the account’s' })
  async delete(
    @CurrentAccount() account: AccountRecord,
    @Body() body: DeleteAccountDto,
    @Req() req: FastifyRequest,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<void> {
    await this.service.delete(account, body);
    // The session row went with the account; the browser's cookie goes too.
    await req.session.destroy();
    void reply.clearCookie('peakwise.sid', { path: '/' });
  }
}
