import { BadRequestException, Injectable } from '@nestjs/common';
import {
  CHECK_COLUMNS,
  CSV_COLUMNS,
  IMPORT_MAX_ROWS,
  OBSERVATION_SEPARATOR,
  PREVIEW_ROWS,
  REQUIRED_COLUMNS,
  type AccountExport,
  type CsvColumn,
  type CsvRow,
  type FieldError,
  type ImportError,
  type ImportRequest,
  type ImportResult,
} from '@peakwise/shared';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import Papa from 'papaparse';
import { toAccount } from '../account/account.mapper.js';
import type { AccountRecord } from '../account/account.repository.js';
import { fieldError } from '../common/validation.js';
import { CultureService } from '../culture/culture.service.js';
import { CreateFeedingDto } from '../feeding/dto/feeding.dto.js';
import { toFeeding } from '../feeding/feeding.mapper.js';
import { CreateRiseCheckDto } from '../rise-check/dto/rise-check.dto.js';
import { toRiseCheck } from '../rise-check/rise-check.mapper.js';
import { toTemperatureReading } from '../temperature/temperature.mapper.js';
import { csvFileName } from './csv-columns.js';
import { LogbookTransferRepository, type ImportFeeding } from './logbook-transfer.repository.js';

/** At most this many row errors are reported; the rest would only repeat them. */
const MAX_REPORTED_ERRORS = 200;

/** Which of our columns each request field of the feeding and rise-check DTOs comes from. */
const FEEDING_FIELDS: Record<string, CsvColumn> = {
  fedAt: 'fed_at',
  starterG: 'starter_g',
  flourG: 'flour_g',
  waterG: 'water_g',
  flour: 'flour',
  temperatureC: 'temperature_c',
  waterTemperatureC: 'water_temperature_c',
  initialHeightMm: 'initial_height_mm',
  observations: 'observations',
  notes: 'notes',
};
const CHECK_FIELDS: Record<string, CsvColumn> = {
  takenAt: 'check_taken_at',
  heightMm: 'check_height_mm',
  temperatureC: 'check_temperature_c',
};

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A cell as the JSON API would receive it: empty → left out, numbers → numbers, else as text. */
function numberCell(value: string): number | string | undefined {
  const trimmed = value.trim();
  if (trimmed === '') return undefined;
  return NUMBER.test(trimmed) ? Number(trimmed) : trimmed;
}
const textCell = (value: string): string | undefined => (value.trim() === '' ? undefined : value);

/** The time to the second: the grain at which two feedings or checks are the same one. */
const second = (iso: string | Date) => Math.floor(new Date(iso).getTime() / 1000);

function validationErrors(errors: ValidationError[], columns: Record<string, CsvColumn>, line: number): ImportError[] {
  return errors.map((error) => ({
    line,
    field: columns[error.property] ?? error.property,
    message: Object.values(error.constraints ?? {})[0] ?? 'Check this value.',
  }));
}

function validate<T extends object>(cls: new () => T, plain: object): { value: T; errors: ValidationError[] } {
  const value = plainToInstance(cls, plain);
  return { value, errors: validateSync(value, { validationError: { target: false, value: false } }) };
}

interface ParsedRow {
  line: number;
  cells: Record<string, string>;
}

/** Parses a CSV with a header row, noting the file line on which each record starts. */
function parseCsv(csv: string): { fields: string[]; rows: ParsedRow[]; errors: ImportError[] } {
  const rows: ParsedRow[] = [];
  const errors: ImportError[] = [];
  let fields: string[] | undefined;
  let start = 0;
  let line = 1;
  const advance = (to: number) => {
    for (let i = start; i < to; i++) if (csv[i] === '\n') line++;
    start = Math.max(start, to);
  };
  Papa.parse<string[]>(csv, {
    skipEmptyLines: true,
    step: (result, parser) => {
      let i = start;
      while (csv[i] === '\r' || csv[i] === '\n') i++;
      advance(i);
      const rowLine = line;
      advance(result.meta.cursor);
      if (!fields) {
        fields = result.data.map((field) => field.trim());
        return;
      }
      if (rows.length >= IMPORT_MAX_ROWS) {
        rows.push({ line: rowLine, cells: {} });
        parser.abort();
        return;
      }
      const cells = Object.fromEntries(fields.map((field, index) => [field, result.data[index] ?? '']));
      rows.push({ line: rowLine, cells });
      if (result.data.length !== fields.length) {
        const message = `This row has ${result.data.length} cells; the header has ${fields.length}.`;
        errors.push({ line: rowLine, field: 'row', message });
      }
      for (const problem of result.errors) errors.push({ line: rowLine, field: 'row', message: problem.message });
    },
  });
  return { fields: fields ?? [], rows, errors };
}

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
    const rows: string[][] = [];
    for (const feeding of feedings) {
      const cells = [
        feeding.fedAt.toISOString(),
        String(feeding.starterG),
        String(feeding.flourG),
        String(feeding.waterG),
        feeding.flour ?? '',
        feeding.temperatureC === null ? '' : String(feeding.temperatureC),
        feeding.waterTemperatureC === null ? '' : String(feeding.waterTemperatureC),
        feeding.initialHeightMm === null ? '' : String(feeding.initialHeightMm),
        feeding.observations.join(OBSERVATION_SEPARATOR),
        feeding.notes ?? '',
      ];
      const own = checks.filter((check) => check.feedingId === feeding.id);
      if (!own.length) rows.push([...cells, '', '', '']);
      for (const check of own) {
        rows.push([
          ...cells,
          check.takenAt.toISOString(),
          String(check.heightMm),
          check.temperatureC === null ? '' : String(check.temperatureC),
        ]);
      }
    }
    const csv = Papa.unparse({ fields: [...CSV_COLUMNS], data: rows }, { header: true, newline: '\r\n' });
    return { fileName: csvFileName(culture.name), csv: `${csv}\r\n` };
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

  async importCsv(account: AccountRecord, cultureId: string, request: ImportRequest): Promise<ImportResult> {
    await this.cultures.requireOwned(account, cultureId);
    const headers = this.headers(request.mapping ?? {});
    const parsed = parseCsv(request.csv);
    if (parsed.rows.length > IMPORT_MAX_ROWS) {
      throw fieldError('csv', `Import at most ${IMPORT_MAX_ROWS} rows at a time; split the file.`);
    }
    for (const column of REQUIRED_COLUMNS) {
      if (!parsed.fields.includes(headers[column])) {
        throw fieldError(
          request.mapping?.[column] !== undefined ? `mapping.${column}` : 'csv',
          `The file has no "${headers[column]}" column; map ${column} to one of its headers.`,
        );
      }
    }

    const [existingFeedings, existingChecks] = await Promise.all([
      this.repository.feedingsOfCulture(cultureId),
      this.repository.checksOfCulture(cultureId),
    ]);
    const feedingIdBySecond = new Map(existingFeedings.map((f) => [second(f.fedAt), f.id]));
    const checkKeys = new Set(existingChecks.map((c) => `${c.feedingId}|${second(c.takenAt)}`));

    const errors: ImportError[] = [...parsed.errors];
    const preview: CsvRow[] = [];
    const items = new Map<number, ImportFeeding>();
    const result: ImportResult = {
      dryRun: request.dryRun ?? false,
      feedings: { new: 0, duplicate: 0 },
      riseChecks: { new: 0, duplicate: 0 },
      errors,
      preview,
    };

    for (const { line, cells } of parsed.rows) {
      const row = Object.fromEntries(CSV_COLUMNS.map((c) => [c, cells[headers[c]] ?? ''])) as CsvRow;
      if (preview.length < PREVIEW_ROWS) preview.push(row);
      const rowErrors = this.rowErrors(row, line);
      errors.push(...rowErrors.errors);
      if (rowErrors.errors.length || !rowErrors.feeding) continue;

      const key = second(rowErrors.feeding.fedAt);
      let item = items.get(key);
      if (!item) {
        const existingId = feedingIdBySecond.get(key);
        item = { existingId, feeding: rowErrors.feeding, checks: [] };
        items.set(key, item);
        if (existingId) result.feedings.duplicate++;
        else result.feedings.new++;
      }
      const check = rowErrors.check;
      if (check) {
        const checkKey = `${item.existingId ?? `new:${key}`}|${second(check.takenAt)}`;
        if (checkKeys.has(checkKey)) {
          result.riseChecks.duplicate++;
        } else {
          checkKeys.add(checkKey);
          item.checks.push(check);
          result.riseChecks.new++;
        }
      }
    }

    errors.splice(MAX_REPORTED_ERRORS);
    if (errors.length && !result.dryRun) {
      const details: FieldError[] = errors.map((e) => ({ field: `line ${e.line}: ${e.field}`, message: e.message }));
      throw new BadRequestException({ message: 'Some rows need another look; nothing was imported.', details });
    }
    if (!result.dryRun) {
      const toWrite = [...items.values()].filter((item) => !item.existingId || item.checks.length);
      await this.repository.importAll(cultureId, toWrite);
    }
    return result;
  }

  /** Our column → the header to read it from. */
  private headers(mapping: Record<string, unknown>): Record<CsvColumn, string> {
    for (const [key, value] of Object.entries(mapping)) {
      if (!(CSV_COLUMNS as readonly string[]).includes(key)) {
        throw fieldError(`mapping.${key}`, `Map only our columns: ${CSV_COLUMNS.join(', ')}.`);
      }
      if (typeof value !== 'string' || value === '') throw fieldError(`mapping.${key}`, 'Name a header of the file.');
    }
    return Object.fromEntries(CSV_COLUMNS.map((c) => [c, (mapping[c] as string | undefined) ?? c])) as Record<
      CsvColumn,
      string
    >;
  }

  /** One row checked by the same rules as the feeding and rise-check APIs. */
  private rowErrors(
    row: CsvRow,
    line: number,
  ): {
    errors: ImportError[];
    feeding?: ImportFeeding['feeding'] & { fedAt: string };
    check?: { takenAt: string; heightMm: number; temperatureC?: number };
  } {
    const errors: ImportError[] = [];
    const observations = textCell(row.observations)
      ?.split(OBSERVATION_SEPARATOR)
      .map((o) => o.trim())
      .filter(Boolean);
    const feeding = validate(CreateFeedingDto, {
      fedAt: textCell(row.fed_at)?.trim(),
      starterG: numberCell(row.starter_g),
      flourG: numberCell(row.flour_g),
      waterG: numberCell(row.water_g),
      flour: textCell(row.flour),
      temperatureC: numberCell(row.temperature_c),
      waterTemperatureC: numberCell(row.water_temperature_c),
      initialHeightMm: numberCell(row.initial_height_mm),
      observations,
      notes: textCell(row.notes),
    });
    if (!textCell(row.fed_at)) errors.push({ line, field: 'fed_at', message: 'Enter when the culture was fed.' });
    errors.push(...validationErrors(feeding.errors, FEEDING_FIELDS, line));

    const hasCheck = CHECK_COLUMNS.some((c) => textCell(row[c]) !== undefined);
    let check: { takenAt: string; heightMm: number; temperatureC?: number } | undefined;
    if (hasCheck) {
      const validated = validate(CreateRiseCheckDto, {
        takenAt: textCell(row.check_taken_at)?.trim(),
        heightMm: numberCell(row.check_height_mm),
        temperatureC: numberCell(row.check_temperature_c),
      });
      if (!textCell(row.check_taken_at)) {
        errors.push({ line, field: 'check_taken_at', message: 'Enter when the rise was checked.' });
      }
      errors.push(...validationErrors(validated.errors, CHECK_FIELDS, line));
      const { takenAt, heightMm, temperatureC } = validated.value;
      if (takenAt && heightMm !== undefined) check = { takenAt, heightMm, temperatureC: temperatureC ?? undefined };
      const fedAt = feeding.value.fedAt;
      if (check && fedAt && !errors.length && Date.parse(check.takenAt) < Date.parse(fedAt)) {
        errors.push({
          line,
          field: 'check_taken_at',
          message: `This is before the feeding (fed at ${new Date(fedAt).toISOString()}).`,
        });
      }
    }
    if (errors.length) return { errors };
    const f = feeding.value;
    return {
      errors,
      check,
      feeding: {
        fedAt: f.fedAt!,
        starterG: f.starterG!,
        flourG: f.flourG!,
        waterG: f.waterG!,
        flour: f.flour ?? null,
        temperatureC: f.temperatureC ?? null,
        waterTemperatureC: f.waterTemperatureC ?? null,
        initialHeightMm: f.initialHeightMm ?? null,
        observations: f.observations ?? [],
        notes: f.notes ?? null,
      },
    };
  }
}
