/**
 * The one error every baker's-math function throws for bad input. A RangeError subclass (not a
 * result union) so the happy path stays plain numbers; the `path` names the offending input field
 * in the project's dotted style (`ingredients.2.grams`, see contracts/errors.ts), so the CLI can
 * answer `{ error, path }` and the API a `FieldError` without parsing the message.
 */
export class BakersMathError extends RangeError {
  override readonly name = 'BakersMathError';
  readonly path: string;

  constructor(path: string, message: string) {
    super(message);
    this.path = path;
  }
}

/** Joins path segments, skipping empty ones, so nested callers can prefix their own field. */
export function fieldPath(...segments: (string | number | undefined)[]): string {
  return segments.filter((s) => s !== undefined && s !== '').join('.');
}

export function requireFinite(value: unknown, path: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new BakersMathError(path, `${path || 'value'} must be a finite number`);
  }
  return value;
}

export function requireNonNegative(value: unknown, path: string): number {
  const n = requireFinite(value, path);
  if (n < 0) throw new BakersMathError(path, `${path || 'value'} must not be negative`);
  return n;
}

export function requirePositive(value: unknown, path: string): number {
  const n = requireFinite(value, path);
  if (n <= 0) throw new BakersMathError(path, `${path || 'value'} must be greater than 0`);
  return n;
}
