import { Body, Controller, HttpCode, Post, UseGuards } from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiNoContentResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { PasswordResetRequested } from '@peakwise/shared';
import { Public } from '../common/auth.decorators.js';
import { PasswordResetConfirmDto } from './dto/password-reset-confirm.dto.js';
import { PasswordResetRequestDto } from './dto/password-reset-request.dto.js';
import { PasswordResetRequestedView } from './dto/password-reset-requested.view.js';
import { PasswordResetService } from './password-reset.service.js';

@ApiTags('auth')
@Controller('auth/password-reset')
export class PasswordResetController {
  constructor(private readonly service: PasswordResetService) {}

  @Public()
  // Throttled like sign-in: each request sends a mail, and each confirm is a guess at a token.
  @UseGuards(ThrottlerGuard)
  @Post()
  @HttpCode(202)
  @ApiAcceptedResponse({
    type: PasswordResetRequestedView,
    description: 'The same answer whether or not the address has an account; a link is mailed if it has',
  })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address in the last minute' })
  request(@Body() body: PasswordResetRequestDto): Promise<PasswordResetRequested> {
    return this.service.request(body.email);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('confirm')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Password set; every session of the account has ended' })
  @ApiBadRequestResponse({
    description: 'Token unknown, expired or used (field `token`), or password refused (`password`)',
  })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address in the last minute' })
  async confirm(@Body() body: PasswordResetConfirmDto): Promise<void> {
    await this.service.confirm(body);
  }
}
