import { Body, Controller, Delete, Get, Headers, HttpCode, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { PushDevice, PushDeviceListResponse, PushPublicKey, PushTestResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import {
  CreatePushSubscriptionDto,
  PushDeviceListView,
  PushDeviceView,
  PushPublicKeyView,
  PushTestView,
} from './dto/push.dto.js';
import { PushService } from './push.service.js';

/** Web push: the server's public key and the signed-in baker's devices. */
@ApiTags('push')
@Controller('push')
export class PushController {
  constructor(private readonly service: PushService) {}

  @Get('key')
  @ApiOkResponse({ type: PushPublicKeyView, description: 'The applicationServerKey for PushManager.subscribe()' })
  key(): Promise<PushPublicKey> {
    return this.service.publicKey();
  }

  @Get('subscriptions')
  @ApiOkResponse({ type: PushDeviceListView })
  list(@CurrentAccount() account: AccountRecord): Promise<PushDeviceListResponse> {
    return this.service.list(account);
  }

  /** Idempotent by nature: the same endpoint again updates its one row. */
  @Post('subscriptions')
  @ApiCreatedResponse({ type: PushDeviceView })
  @ApiBadRequestResponse({ description: 'Field-named, e.g. endpoint when it is not a public https URL' })
  subscribe(
    @CurrentAccount() account: AccountRecord,
    @Body() body: CreatePushSubscriptionDto,
    @Headers('user-agent') userAgent?: string,
  ): Promise<PushDevice> {
    return this.service.subscribe(account, body, userAgent);
  }

  @Delete('subscriptions/:id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The device gets no more push alerts' })
  @ApiNotFoundResponse({ description: 'No device of yours with this id' })
  remove(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.remove(account, id);
  }

  @Post('subscriptions/:id/test')
  @HttpCode(200)
  @ApiOkResponse({ type: PushTestView })
  @ApiNotFoundResponse({ description: 'No device of yours with this id' })
  test(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<PushTestResponse> {
    return this.service.test(account, id);
  }
}
