import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Culture, CultureListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { CultureService } from './culture.service.js';
import { CreateCultureDto, UpdateCultureDto } from './dto/culture.dto.js';
import { CultureListView, CultureView } from './dto/culture.view.js';
import { ListCulturesQuery } from './dto/list-cultures.query.js';

/** The signed-in baker's cultures. Another account's culture answers 404, never 403. */
@ApiTags('cultures')
@Controller('cultures')
export class CultureController {
  constructor(private readonly service: CultureService) {}

  @Post()
  @Idempotent()
  @ApiCreatedResponse({ type: CultureView })
  create(@CurrentAccount() account: AccountRecord, @Body() body: CreateCultureDto): Promise<Culture> {
    return this.service.create(account, body);
  }

  @Get()
  @ApiOkResponse({ type: CultureListView })
  list(@CurrentAccount() account: AccountRecord, @Query() query: ListCulturesQuery): Promise<CultureListResponse> {
    return this.service.list(account, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: CultureView })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  get(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<Culture> {
    return this.service.get(account, id);
  }

  @Patch(':id')
  @Idempotent()
  @ApiOkResponse({ type: CultureView })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: UpdateCultureDto,
  ): Promise<Culture> {
    return this.service.update(account, id, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its feedings, rise checks and readings' })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }
}
