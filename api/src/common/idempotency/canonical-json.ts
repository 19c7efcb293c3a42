import { createHash } from 'node:crypto';

/**
 * JSON with object keys sorted at every level: the same request always gives the same text.
 * Written with its own stack, not recursion: a body nested thousands deep (which JSON.parse
 * accepts) must not overflow the call stack before validation gets to refuse it.
 */
export function canonicalJson(value: unknown): string {
  const out: string[] = [];
  // Popped from the end: a value to write, or a piece of punctuation already decided.
  const work: ({ value: unknown } | string)[] = [{ value }];
  while (work.length > 0) {
    const item = work.pop()!;
    if (typeof item === 'string') {
      out.push(item);
      continue;
    }
    const current = item.value;
    if (Array.isArray(current)) {
      work.push(']');
      for (let i = current.length - 1; i >= 0; i--) {
        work.push({ value: current[i] });
        if (i > 0) work.push(',');
      }
      work.push('[');
    } else if (current !== null && typeof current === 'object') {
      const object = current as Record<string, unknown>;
      const keys = Object.keys(object)
        .filter((key) => object[key] !== undefined)
        .sort();
      work.push('}');
      for (let i = keys.length - 1; i >= 0; i--) {
        work.push({ value: object[keys[i]!] });
        work.push(`${i > 0 ? ',' : ''}${JSON.stringify(keys[i])}:`);
      }
      work.push('{');
    } else {
      out.push(JSON.stringify(current) ?? 'null');
    }
  }
  return out.join('');
}

/** sha256 (hex) of a request body in canonical JSON: `{"a":1,"b":2}` and `{"b":2,"a":1}` match. */
export function requestHash(body: unknown): string {
  return createHash('sha256')
    .update(canonicalJson(body ?? null))
    .digest('hex');
}
