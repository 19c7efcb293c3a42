// Reading untrusted JSON for the command-line face of the model: every rejection names the
// offending field by its path (e.g. `readings.3.heightMm`), so a caller can fix it.

export class InputError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(message);
  }
}

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type JsonObject = { [key: string]: Json };

function join(path: string, key: string | number): string {
  return path ? `${path}.${key}` : String(key);
}

export function object(value: Json | undefined, path: string): JsonObject {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new InputError(path, 'must be a JSON object');
  }
  return value;
}

export function array(parent: JsonObject, key: string, path: string): Json[] {
  const value = parent[key];
  if (!Array.isArray(value)) throw new InputError(join(path, key), 'must be an array');
  return value;
}

export function optionalArray(parent: JsonObject, key: string, path: string): Json[] | undefined {
  return parent[key] === undefined ? undefined : array(parent, key, path);
}

interface NumberRule {
  min?: number;
  max?: number;
  /** Strictly above `min` rather than at or above. */
  exclusiveMin?: boolean;
}

export function number(parent: JsonObject, key: string, path: string, rule: NumberRule = {}): number {
  const value = parent[key];
  const at = join(path, key);
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new InputError(at, 'must be a finite number');
  if (rule.min !== undefined && (rule.exclusiveMin ? value <= rule.min : value < rule.min)) {
    throw new InputError(at, `must be ${rule.exclusiveMin ? 'greater than' : 'at least'} ${rule.min}`);
  }
  if (rule.max !== undefined && value > rule.max) throw new InputError(at, `must be at most ${rule.max}`);
  return value;
}

export function optionalNumber(parent: JsonObject, key: string, path: string, rule?: NumberRule): number | undefined {
  return parent[key] === undefined ? undefined : number(parent, key, path, rule);
}

export function string(parent: JsonObject, key: string, path: string): string {
  const value = parent[key];
  if (typeof value !== 'string' || value.length === 0)
    throw new InputError(join(path, key), 'must be a non-empty string');
  return value;
}

export function optionalString(parent: JsonObject, key: string, path: string): string | undefined {
  return parent[key] === undefined ? undefined : string(parent, key, path);
}

export function oneOf<T extends string>(parent: JsonObject, key: string, path: string, choices: readonly T[]): T {
  const value = string(parent, key, path);
  if (!(choices as readonly string[]).includes(value)) {
    throw new InputError(join(path, key), `must be one of ${choices.join(', ')}`);
  }
  return value as T;
}

/** ISO 8601 with an offset (`2026-12-01T08:00:00+01:00` or `…Z`): a bare local time is ambiguous. */
const ISO_WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;

export function isoTime(parent: JsonObject, key: string, path: string): string {
  const value = string(parent, key, path);
  if (!ISO_WITH_OFFSET.test(value) || Number.isNaN(Date.parse(value))) {
    throw new InputError(join(path, key), 'must be an ISO 8601 time with an offset, e.g. 2026-12-01T08:00:00+01:00');
  }
  return value;
}

export function optionalIsoTime(parent: JsonObject, key: string, path: string): string | undefined {
  return parent[key] === undefined ? undefined : isoTime(parent, key, path);
}

export function each<T>(items: Json[], path: string, read: (item: JsonObject, itemPath: string) => T): T[] {
  return items.map((item, index) => {
    const itemPath = join(path, index);
    return read(object(item, itemPath), itemPath);
  });
}

export { join as joinPath };
