import { CHECK_COLUMNS, OBSERVATION_SEPARATOR, type CsvColumn, type CsvRow, type ImportError } from '@peakwise/shared';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import { CreateFeedingDto } from '../feeding/dto/feeding.dto.js';
import { CreateRiseCheckDto } from '../rise-check/dto/rise-check.dto.js';
import { PLAIN_NUMBER } from './csv-formula-escape.js';
import type { ImportFeeding } from './logbook-transfer.repository.js';

/** A row's feeding, ready to write; fedAt is required, so a row without it never gets this far. */
export type RowFeeding = ImportFeeding['feeding'] & { fedAt: string };
export interface RowCheck {
  takenAt: string;
  heightMm: number;
  temperatureC?: number;
}

/** A checked row: errors, or the feeding and (when the check columns are filled) its rise check. */
export interface CheckedRow {
  errors: ImportError[];
  feeding?: RowFeeding;
  check?: RowCheck;
}

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

/** A cell as the JSON API would receive it: empty → left out, numbers → numbers, else as text. */
function numberCell(value: string): number | string | undefined {
  const trimmed = value.trim();
  if (trimmed === '') return undefined;
  return PLAIN_NUMBER.test(trimmed) ? Number(trimmed) : trimmed;
}
const textCell = (value: string): string | undefined => (value.trim() === '' ? undefined : value);

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

/** One row checked by the same rules (the same DTOs) as the feeding and rise-check APIs. */
export function checkRow(row: CsvRow, line: number): CheckedRow {
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
  let check: RowCheck | undefined;
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
