import { Controller, Get } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { CultureSummary } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { CultureSummaryService } from './culture-summary.service.js';
import { CultureSummaryView } from './dto/culture-summary.view.js';

/** Where one of the signed-in baker's cultures stands and when it will be ready. */
@ApiTags('cultures')
@Controller('cultures')
export class CultureSummaryController {
  constructor(private readonly service: CultureSummaryService) {}

  @Get(':id/summary')
  @ApiOkResponse({ type: CultureSummaryView })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  summary(@CurrentAccount() account: AccountRecord, @IdParam() id: string): Promise<CultureSummary> {
    return this.service.summary(account, id);
  }
}
