import { createHash } from 'node:crypto';

/** JSON with object keys sorted at every level: the same request always gives the same text. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const object = value as Record<string, unknown>;
    const members = Object.keys(object)
      .filter((key) => object[key] !== undefined)
      .sort()
      .map((key) => `${JSON.stringify(key)}:${canonicalJson(object[key])}`);
    return `{${members.join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** sha256 (hex) of a request body in canonical JSON: `{"a":1,"b":2}` and `{"b":2,"a":1}` match. */
export function requestHash(body: unknown): string {
  return createHash('sha256')
    .update(canonicalJson(body ?? null))
    .digest('hex');
}
