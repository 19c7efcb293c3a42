import { Body, Controller, Get, HttpCode, Post, Res } from '@nestjs/common';
import { ApiBadRequestResponse, ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { CSV_COLUMNS, type AccountExport, type ImportResult } from '@peakwise/shared';
import { ImportFeedingsDto, ImportResultView } from './dto/import.dto.js';
import { LogbookTransferService } from './logbook-transfer.service.js';

/** The signed-in baker's logbook out as files, and feedings back in from a CSV. */
@ApiTags('import-export')
@Controller()
export class LogbookTransferController {
  constructor(private readonly service: LogbookTransferService) {}

  @Get('cultures/:id/export.csv')
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: `One row per rise check, feeding columns repeated: ${CSV_COLUMNS.join(', ')}` })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  async exportCsv(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<string> {
    const { fileName, csv } = await this.service.exportCsv(account, id);
    reply.header('content-type', 'text/csv; charset=utf-8');
    reply.header('content-disposition', `attachment; filename="${fileName}"`);
    return csv;
  }

  @Get('account/export.json')
  @ApiOkResponse({ description: 'The whole account: profile, cultures, feedings, rise checks, temperature readings' })
  exportAccount(@CurrentAccount() account: AccountRecord): Promise<AccountExport> {
    return this.service.exportAccount(account);
  }

  @Post('cultures/:id/import')
  @HttpCode(200)
  @ApiOkResponse({ type: ImportResultView, description: 'Imported, or with dryRun checked and counted only' })
  @ApiBadRequestResponse({ description: 'A row needs another look (details name line and column); nothing written' })
  @ApiNotFoundResponse({ description: 'No culture of yours with this id' })
  importCsv(
    @CurrentAccount() account: AccountRecord,
    @IdParam() id: string,
    @Body() body: ImportFeedingsDto,
  ): Promise<ImportResult> {
    return this.service.importCsv(account, id, body);
  }
}
