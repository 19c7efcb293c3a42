import { BadRequestException, Injectable } from '@nestjs/common';
import {
  IMPORT_MAX_ROWS,
  type AccountExport,
  type FieldError,
  type ImportRequest,
  type ImportResult,
} from '@peakwise/shared';
import { toAccount } from '../account/account.mapper.js';
import type { AccountRecord } from '../account/account.repository.js';
import { fieldError } from '../common/validation.js';
import { CultureService } from '../culture/culture.service.js';
import { toFeeding } from '../feeding/feeding.mapper.js';
import { toRiseCheck } from '../rise-check/rise-check.mapper.js';
import { toTemperatureReading } from '../temperature/temperature.mapper.js';
import { csvFileName } from './csv-columns.js';
import { writeFeedingsCsv } from './csv-export.writer.js';
import { columnHeaders, requireColumns } from './csv-header-mapping.js';
import { parseCsv } from './csv-reader.js';
import { planImport } from './import-planner.js';
import { LogbookTransferRepository } from './logbook-transfer.repository.js';

/** At most this many row errors are reported; the rest would only repeat them. */
const MAX_REPORTED_ERRORS = 200;

/** The logbook out as files and feedings back in: access, loading and writing; the CSV work is in its own files. */
@Injectable()
export class LogbookTransferService {
  constructor(
    private readonly repository: LogbookTransferRepository,
    private readonly cultures: CultureService,
  ) {}

  async exportCsv(account: AccountRecord, cultureId: string): Promise<{ fileName: string; csv: string }> {
    const culture = await this.cultures.requireOwned(account, cultureId);
    const [feedings, checks] = await Promise.all([
      this.repository.feedingsOfCulture(cultureId),
      this.repository.checksOfCulture(cultureId),
    ]);
    return { fileName: csvFileName(culture.name), csv: writeFeedingsCsv(feedings, checks) };
  }

  async exportAccount(account: AccountRecord): Promise<AccountExport> {
    const [cultures, feedings, checks, readings] = await Promise.all([
      this.cultures.list(account, { sort: 'name', limit: Number.MAX_SAFE_INTEGER, offset: 0 }),
      this.repository.feedingsOfAccount(account.id),
      this.repository.checksOfAccount(account.id),
      this.repository.readingsOfAccount(account.id),
    ]);
    return {
      format: 'peakwise-export',
      version: 1,
      exportedAt: new Date().toISOString(),
      account: toAccount(account),
      cultures: cultures.items,
      feedings: feedings.map(toFeeding),
      riseChecks: checks.map(toRiseCheck),
      temperatureReadings: readings.map(toTemperatureReading),
    };
  }

  /** Checks the whole file first and writes all of it or nothing; a dry run only counts. */
  async importCsv(account: AccountRecord, cultureId: string, request: ImportRequest): Promise<ImportResult> {
    await this.cultures.requireOwned(account, cultureId);
    const headers = columnHeaders(request.mapping);
    const parsed = parseCsv(request.csv);
    if (parsed.rows.length > IMPORT_MAX_ROWS) {
      throw fieldError('csv', `Import at most ${IMPORT_MAX_ROWS} rows at a time; split the file.`);
    }
    requireColumns(parsed.fields, headers, request.mapping);

    const [feedings, checks] = await Promise.all([
      this.repository.feedingsOfCulture(cultureId),
      this.repository.checksOfCulture(cultureId),
    ]);
    const { result, items } = planImport(parsed, headers, { feedings, checks }, request.dryRun ?? false);

    result.errors.splice(MAX_REPORTED_ERRORS);
    if (result.dryRun) return result;
    if (result.errors.length) {
      const details: FieldError[] = result.errors.map((e) => ({
        field: `line ${e.line}: ${e.field}`,
        message: e.message,
      }));
      throw new BadRequestException({ message: 'Some rows need another look; nothing was imported.', details });
    }
    await this.repository.importAll(
      cultureId,
      items.filter((item) => !item.existingId || item.checks.length),
    );
    return result;
  }
}
