import type { PageQuery, Paged, SortOrder } from './paging.js';

// The culture logbook: cultures, feedings, rise checks and temperature readings. Measurements are
// SI (g, mm, °C); times are ISO 8601 strings, sent with a zone and answered in UTC.

export const CULTURE_NAME_MAX_LENGTH = 80;
export const NOTES_MAX_LENGTH = 2000;
/** A flour's name or a blend in words, e.g. "70 % bread flour, 30 % whole rye". */
export const FLOUR_MAX_LENGTH = 120;
export const HYDRATION_MAX_PCT = 1000;
/** Per ingredient of one feeding; far above any jar, low enough to catch a slip of the finger. */
export const GRAMS_MAX = 20_000;
export const TEMPERATURE_MIN_C = -5;
export const TEMPERATURE_MAX_C = 50;
export const HEIGHT_MAX_MM = 1000;
/** Log times may run this far ahead of the server's clock (phones' clocks drift). */
export const FUTURE_TOLERANCE_MINUTES = 5;
export const EARLIEST_LOG_TIME = '2000-01-01T00:00:00.000Z';
/** "Started on" may go back this far: some bakeries keep very old cultures. */
export const EARLIEST_STARTED_ON = '1800-01-01';
export const TEMPERATURE_READINGS_MAX_PER_REQUEST = 1000;

export const CULTURE_LOCATIONS = ['counter', 'fridge'] as const;
export type CultureLocation = (typeof CULTURE_LOCATIONS)[number];

/**
 * What a baker notices at feeding time. `discolouration` is the one that calls for the caution.
 * feeding.observations has a CHECK with this list: adding a word needs a migration too.
 */
export const FEEDING_OBSERVATIONS = [
  'bubbles',
  'domed',
  'sour-smell',
  'yeasty-smell',
  'acetone-smell',
  'hooch',
  'discolouration',
] as const;
export type FeedingObservation = (typeof FEEDING_OBSERVATIONS)[number];

// ---- cultures

export interface Culture {
  id: string;
  name: string;
  notes: string | null;
  defaultFlour: string | null;
  defaultHydrationPct: number | null;
  location: CultureLocation;
  /** A calendar date, YYYY-MM-DD. */
  startedOn: string | null;
  /** The culture this one descends from (same account), or null. */
  parentCultureId: string | null;
  archived: boolean;
  archivedAt: string | null;
  /** fedAt of the latest feeding, or null if never fed here. */
  lastFedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface CreateCultureRequest {
  name: string;
  notes?: string | null;
  defaultFlour?: string | null;
  defaultHydrationPct?: number | null;
  /** `counter` when left out. */
  location?: CultureLocation;
  startedOn?: string | null;
  parentCultureId?: string | null;
}

/** Only the fields sent change; `null` clears a field that may be empty. */
export interface UpdateCultureRequest extends Partial<CreateCultureRequest> {
  /** true archives (keeping the first archive time), false brings the culture back to the Shelf. */
  archived?: boolean;
}

export const CULTURE_SORTS = ['name', 'lastFedAt'] as const;
export type CultureSort = (typeof CULTURE_SORTS)[number];

export interface CultureListQuery extends PageQuery {
  /** Left out: archived and active cultures alike. */
  archived?: boolean;
  /** `name` (default, A→Z) or `lastFedAt` (default newest first; never-fed cultures last). */
  sort?: CultureSort;
  order?: SortOrder;
}

export type CultureListResponse = Paged<Culture>;

// ---- feedings

export interface Feeding {
  id: string;
  cultureId: string;
  fedAt: string;
  starterG: number;
  flourG: number;
  waterG: number;
  flour: string | null;
  waterTemperatureC: number | null;
  /** Room or jar temperature at feeding time. */
  temperatureC: number | null;
  /** Starter height right after feeding, in mm from the jar's base; rise checks are relative to it. */
  initialHeightMm: number | null;
  notes: string | null;
  observations: FeedingObservation[];
  createdAt: string;
  updatedAt: string;
}

/**
 * Amounts come either as the three weights or as `ratio` (starter:flour:water, e.g. "1:2:2")
 * with `totalG`, which the API turns into weights with `gramsFromRatio`. Never both.
 */
export interface CreateFeedingRequest {
  /** Now when left out. */
  fedAt?: string;
  starterG?: number;
  flourG?: number;
  waterG?: number;
  ratio?: string;
  totalG?: number;
  flour?: string | null;
  waterTemperatureC?: number | null;
  temperatureC?: number | null;
  initialHeightMm?: number | null;
  notes?: string | null;
  observations?: FeedingObservation[];
}

/** As for creating; only the fields sent change. A ratio with a total replaces all three weights. */
export type UpdateFeedingRequest = CreateFeedingRequest;

export interface FeedingListQuery extends PageQuery {
  /** By fedAt; newest first (`desc`) unless asked otherwise. */
  order?: SortOrder;
}

export type FeedingListResponse = Paged<Feeding>;

// ---- rise checks

export interface RiseCheck {
  id: string;
  feedingId: string;
  takenAt: string;
  /** mm from the jar's base. */
  heightMm: number;
  temperatureC: number | null;
  createdAt: string;
  updatedAt: string;
}

/**
 * The height comes as exactly one of `heightMm`, `risePct` (% above the feeding's initial height:
 * 100 means doubled) or `multiple` (× the initial height: 2 means doubled). The last two need the
 * feeding's initialHeightMm; the height is stored in mm.
 */
export interface CreateRiseCheckRequest {
  /** Now when left out; never before the feeding's fedAt. */
  takenAt?: string;
  heightMm?: number;
  risePct?: number;
  multiple?: number;
  temperatureC?: number | null;
}

export type UpdateRiseCheckRequest = CreateRiseCheckRequest;

export type RiseCheckListResponse = Paged<RiseCheck>;

// ---- temperature readings

export interface TemperatureReading {
  id: string;
  feedingId: string;
  takenAt: string;
  temperatureC: number;
  createdAt: string;
}

export interface NewTemperatureReading {
  /** Never before the feeding's fedAt. */
  takenAt: string;
  temperatureC: number;
}

/** Always a batch (one reading is a batch of one), so a logger's series goes in one request. */
export interface CreateTemperatureReadingsRequest {
  readings: NewTemperatureReading[];
}

export interface TemperatureReadingBatchResponse {
  items: TemperatureReading[];
}

export type TemperatureReadingListResponse = Paged<TemperatureReading>;
