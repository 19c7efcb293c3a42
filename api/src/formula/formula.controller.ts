import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { Formula, FormulaComputed, FormulaListResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { ComputeFormulaDto, CreateFormulaDto, UpdateFormulaDto } from './dto/formula.dto.js';
import { FormulaComputedView, FormulaListView, FormulaView } from './dto/formula.view.js';
import { ListFormulasQuery } from './dto/list-formulas.query.js';
import { FormulaService } from './formula.service.js';

/** The signed-in baker's formulas, private to them. Another account's formula answers 404. */
@ApiTags('formulas')
@Controller('formulas')
export class FormulaController {
  constructor(private readonly service: FormulaService) {}

  @Post('compute')
  @HttpCode(200)
  @ApiOkResponse({
    type: FormulaComputedView,
    description: 'Grams, baker’s percentages, blend and scaling; stores nothing',
  })
  @ApiBadRequestResponse({ description: 'Field-named, e.g. ingredients.2.food when a cup cannot be weighed' })
  compute(@Body() body: ComputeFormulaDto): FormulaComputed {
    return this.service.compute(body);
  }

  @Post()
  @Idempotent()
  @ApiCreatedResponse({ type: FormulaView })
  create(@CurrentAccount() account: AccountRecord, @Body() body: CreateFormulaDto): Promise<Formula> {
    return this.service.create(account, body);
  }

  @Get()
  @ApiOkResponse({ type: FormulaListView })
  list(@CurrentAccount() account: AccountRecord, @Query() query: ListFormulasQuery): Promise<FormulaListResponse> {
    return this.service.list(account, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: FormulaView })
  @ApiNotFoundResponse({ description: 'No formula of yours with this id' })
  get(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<Formula> {
    return this.service.get(account, id);
  }

  @Patch(':id')
  @ApiOkResponse({ type: FormulaView })
  @ApiNotFoundResponse({ description: 'No formula of yours with this id' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: UpdateFormulaDto,
  ): Promise<Formula> {
    return this.service.update(account, id, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its ingredients and blend' })
  @ApiNotFoundResponse({ description: 'No formula of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<void> {
    return this.service.delete(account, id);
  }
}
